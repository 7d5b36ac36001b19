// Positioner job sheet: the technician's page. Plain script, no build step and nothing fetched from
// elsewhere, because the tablet may be on a plant network that reaches only this server.
//
// The whole job lives in one object that is saved to localStorage after every change, so a
// reload, a flat battery or dropped Wi-Fi loses no answer. The screen is redrawn from it.
// The job is also a session on the service, so it leaves a record: each answer is queued with an
// Idempotency-Key made here and saved before it is sent, and the queue is sent in order. A retry
// after a lost reply re-sends the same key, and the service answers it without storing it twice.
'use strict';

(function () {
  const JOB_KEY = 'positioner-job.job.v2';
  const VOCABULARY_KEY = 'positioner-job.vocabulary.v1';
  const PREFS_KEY = 'positioner-job.prefs.v1';
  // Long enough for a slow plant network, short enough that a dead link is reported while the
  // technician is still looking at the screen.
  const TIMEOUT_MS = 20000;
  const TOP_CAUSES = 5;

  // Gauge readings a technician usually has on a callout; the rest sit behind "More readings".
  const FIRST_READINGS = ['supply_pressure', 'pump_discharge_pressure', 'supply_filter_dp', 'drain_pressure',
    'oil_temperature'];

  // Screen words for reading codes. The service has codes and units only; a code not listed
  // here is shown with its underscores turned into spaces.
  const READING_NAMES = {
    supply_pressure: 'Supply pressure at the positioner',
    pump_discharge_pressure: 'Pump discharge pressure',
    supply_filter_dp: 'Supply filter differential',
    drain_pressure: 'Drain pressure at the positioner',
    oil_temperature: 'Oil temperature',
    input_signal: 'Input signal at the positioner',
    commanded_signal: 'Signal the controller sends',
    stem_position: 'Stem position',
    creep_rate: 'Creep rate',
    stroke_time_open: 'Stroke time, opening',
    stroke_time_close: 'Stroke time, closing',
    dead_band: 'Dead band',
    hysteresis: 'Hysteresis',
    oscillation_amplitude: 'Oscillation, peak to peak',
    oscillation_period: 'Oscillation period',
    reservoir_level: 'Reservoir level',
    particle_count_4um: 'Particles 4 µm(c) and over',
    particle_count_6um: 'Particles 6 µm(c) and over',
    particle_count_14um: 'Particles 14 µm(c) and over',
    water_content: 'Water in oil',
    pump_flow: 'Pump flow',
    entrained_air: 'Free air in oil'
  };

  const UNIT_NAMES = {
    degC: '°C', degF: '°F', percent: '%', percent_per_min: '% / min', mm_per_min: 'mm / min',
    in_per_min: 'in / min', per_mL: 'per mL', L_per_min: 'L / min', gpm: 'US gal / min', m3_per_h: 'm³ / h'
  };

  // Controls that exist from the start; each render enables them and then locks what must wait.
  const STATIC_CONTROLS = ['tag', 'work-order', 'author', 'to-symptoms', 'back-to-tag', 'to-readings', 'back-to-symptoms',
    'diagnose', 'theme', 'new-job', 'cant-do', 'undo', 'edit-start', 'close-job', 'stop-close', 'bypass-ack',
    'close-action', 'close-parts', 'close-minutes', 'close-remarks', 'close-back', 'close-send', 'print'];

  const STAGES = { tag: 'step-tag', symptoms: 'step-symptoms', readings: 'step-readings', result: 'result',
    close: 'step-close', closed: 'step-closed' };

  // Where each queued action goes, under api/v1/sessions/{id}/.
  const ENDPOINTS = { symptom: 'symptoms', reading: 'readings', check: 'checks', unavailable: 'unavailable-checks',
    retract: 'retractions', close: 'closure' };
  const NOT_FOUND = 'not_found';

  const FIELD_PARTS = { value: 'the number', unit: 'the unit', quantity: 'the reading', check: 'the check',
    outcome: 'the answer' };
  const CLOSE_FIELDS = { confirmedFault: 'Confirmed cause', action: 'What you did', parts: 'Parts used',
    minutes: 'Minutes spent', remarks: 'Remarks', author: 'Your name' };

  let vocabulary = null;
  let job = loadJson(JOB_KEY) || freshJob();
  let prefs = loadJson(PREFS_KEY) || {};
  let busy = false;
  let flushing = false;
  let notice = null;
  let newJobArmedUntil = 0;

  const $ = (id) => document.getElementById(id);

  // ---------------------------------------------------------------- state and storage

  // checks and unavailable hold what the technician did, each with `ref`: the Idempotency-Key of
  // the action that records it (seqs maps a key to the event's seq once the service has it).
  // `sent` is what has been queued for the service about symptoms and readings, to send changes only.
  function freshJob() {
    return { version: 2, stage: 'tag', tag: '', workOrder: '', symptoms: {}, readings: {}, checks: [], unavailable: [],
      acknowledged: null, response: null, sessionId: null, sent: null, pending: [], seqs: {}, wantResult: false,
      closure: null, closeForm: { fault: '', action: '', parts: '', minutes: '', remarks: '' } };
  }

  // crypto.randomUUID exists only on https or localhost; a plant server on plain http still has
  // getRandomValues, which is as good for a key that must only never repeat.
  function newKey() {
    if (window.crypto && typeof window.crypto.randomUUID === 'function') return window.crypto.randomUUID();
    const b = new Uint8Array(16);
    if (window.crypto && window.crypto.getRandomValues) {
      window.crypto.getRandomValues(b);
    } else {
      for (let i = 0; i < 16; i++) b[i] = Math.floor(Math.random() * 256);
    }
    b[6] = (b[6] & 0x0f) | 0x40;
    b[8] = (b[8] & 0x3f) | 0x80;
    const h = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
    return h.slice(0, 8) + '-' + h.slice(8, 12) + '-' + h.slice(12, 16) + '-' + h.slice(16, 20) + '-' + h.slice(20);
  }

  function loadJson(key) {
    try {
      const text = localStorage.getItem(key);
      return text ? JSON.parse(text) : null;
    } catch (e) {
      return null;
    }
  }

  function saveJson(key, value) {
    try {
      localStorage.setItem(key, JSON.stringify(value));
    } catch (e) {
      // Storage full or blocked (private mode): the job still runs, it just will not survive a reload.
    }
  }

  function save() {
    saveJson(JOB_KEY, job);
  }

  function parseNumber(text) {
    const cleaned = String(text).trim().replace(',', '.');
    if (cleaned === '') return null;
    const n = Number(cleaned);
    return Number.isFinite(n) ? n : NaN;
  }

  function readingNow(q) {
    const r = job.readings[q.code];
    const value = r ? parseNumber(r.value) : null;
    return value === null ? null : { quantity: q.code, value: value, unit: (r && r.unit) || q.units[0] };
  }

  function openRequest() {
    const present = [];
    const absent = [];
    for (const s of vocabulary.symptoms) {
      if (job.symptoms[s.code] === 'present') present.push(s.code);
      if (job.symptoms[s.code] === 'absent') absent.push(s.code);
    }
    const measurements = vocabulary.measurements.map(readingNow).filter(Boolean);
    const body = { tag: job.tag, author: prefs.author, symptoms: present, absentSymptoms: absent, measurements: measurements };
    if (job.workOrder) body.workOrder = job.workOrder;
    return body;
  }

  // The shown result is stale while answers wait to be sent (e.g. tapped offline).
  function resultIsStale() {
    return job.response !== null && job.pending.length > 0;
  }

  // ---------------------------------------------------------------- words

  function humanise(code) {
    const s = String(code).replace(/_/g, ' ');
    return s.charAt(0).toUpperCase() + s.slice(1);
  }

  function readingName(code) {
    return READING_NAMES[code] || humanise(code);
  }

  function unitName(code) {
    return UNIT_NAMES[code] || code;
  }

  function symptomName(code) {
    return humanise(code);
  }

  function checkTitle(code) {
    const c = vocabulary && vocabulary.checksByCode[code];
    return c ? c.title : humanise(code);
  }

  // Service prose names causes and checks by code; a technician reads titles.
  function plain(text) {
    if (!text || !vocabulary) return text || '';
    return String(text).replace(/\b[a-z][a-z0-9]*(?:_[a-z0-9]+)+\b/g, (code) => {
      const f = vocabulary.faultsByCode[code];
      if (f) return '“' + f.title + '”';
      const c = vocabulary.checksByCode[code];
      if (c) return '“' + c.title + '”';
      if (vocabulary.symptomsByCode[code]) return '“' + symptomName(code) + '”';
      return code;
    });
  }

  function percent(p) {
    if (p > 0 && p < 0.005) return '<1 %';
    return Math.round(p * 100) + ' %';
  }

  function minutes(m) {
    return 'about ' + (Math.round(m * 10) / 10) + ' min';
  }

  // Turns a problem field path into words, using the request that was sent to find what it was.
  function fieldInWords(field, body) {
    if (!field) return 'The request';
    let m = /^measurements\[(\d+)\](?:\.(\w+))?$/.exec(field);
    if (m) {
      const sent = body && body.measurements ? body.measurements[Number(m[1])] : null;
      const name = sent ? readingName(sent.quantity) : 'Reading ' + (Number(m[1]) + 1);
      return 'Reading “' + name + '”' + (m[2] ? ', ' + (FIELD_PARTS[m[2]] || m[2]) : '');
    }
    m = /^(symptoms|absentSymptoms)\[(\d+)\]$/.exec(field);
    if (m) {
      const code = body && body[m[1]] ? body[m[1]][Number(m[2])] : null;
      return 'Symptom “' + (code ? symptomName(code) : Number(m[2]) + 1) + '”';
    }
    m = /^checks\[(\d+)\](?:\.(\w+))?$/.exec(field);
    if (m) {
      const sent = body && body.checks ? body.checks[Number(m[1])] : null;
      return 'Answer ' + (Number(m[1]) + 1) + (sent ? ' (“' + checkTitle(sent.check) + '”)' : '')
        + (m[2] ? ', ' + (FIELD_PARTS[m[2]] || m[2]) : '');
    }
    m = /^unavailableChecks\[(\d+)\]$/.exec(field);
    if (m) {
      const code = body && body.unavailableChecks ? body.unavailableChecks[Number(m[1])] : null;
      return 'Check set aside' + (code ? ' (“' + checkTitle(code) + '”)' : '');
    }
    if (field === 'asset.tag' || field === 'tag') return 'Valve tag';
    if (CLOSE_FIELDS[field]) return CLOSE_FIELDS[field];
    m = /^parts\[(\d+)\]$/.exec(field);
    if (m) return 'Part ' + (Number(m[1]) + 1);
    if (field.startsWith('asset')) return 'Valve data (' + field.slice(6) + ')';
    return humanise(field);
  }

  // ---------------------------------------------------------------- talking to the service

  async function fetchJson(url, options) {
    const controller = new AbortController();
    const timer = setTimeout(() => controller.abort(), TIMEOUT_MS);
    try {
      const res = await fetch(url, Object.assign({ signal: controller.signal, cache: 'no-store' }, options));
      let data = null;
      try {
        data = await res.json();
      } catch (e) {
        data = null;
      }
      return { status: res.status, ok: res.ok, data: data };
    } finally {
      clearTimeout(timer);
    }
  }

  async function loadVocabulary() {
    setBusy(true);
    try {
      const r = await fetchJson('api/v1/vocabulary', { headers: { Accept: 'application/json' } });
      if (!r.ok || !r.data) throw new Error('HTTP ' + r.status);
      saveJson(VOCABULARY_KEY, r.data);
      useVocabulary(r.data);
      notice = null;
    } catch (e) {
      // Offline at start-up: the copy kept from the last visit is enough to carry on the job.
      const kept = loadJson(VOCABULARY_KEY);
      if (kept) {
        useVocabulary(kept);
      } else {
        notice = { kind: 'offline', retry: loadVocabulary };
      }
    } finally {
      setBusy(false);
    }
    // Answers kept from before a reload or a dropped link go out now, with the keys they were saved with.
    if (vocabulary && job.pending.length > 0) flush();
  }

  function useVocabulary(v) {
    const index = (list, key) => Object.fromEntries(list.map((x) => [x[key], x]));
    vocabulary = Object.assign({}, v, {
      checksByCode: index(v.checks, 'code'),
      faultsByCode: index(v.faults, 'code'),
      symptomsByCode: index(v.symptoms, 'code'),
      tagsByUpper: Object.fromEntries(v.tags.map((t) => [t.tag.toUpperCase(), t]))
    });
  }

  // ---------------------------------------------------------------- the queue of actions

  // Saved with its key before anything is sent: the key is what makes a retry safe.
  function enqueue(kind, body, target) {
    const key = newKey();
    const action = { kind: kind, key: key, body: Object.assign({ author: prefs.author }, body), attempted: false };
    if (target) action.target = target;
    job.pending.push(action);
    save();
    return key;
  }

  // Takes back what `ref` recorded: an action never sent is simply dropped; one that may have
  // reached the service (sent, reply lost) or was stored is retracted once its seq is known.
  function withdraw(ref) {
    const i = job.pending.findIndex((p) => p.key === ref && !p.attempted && p.kind !== 'open');
    if (i >= 0) {
      job.pending.splice(i, 1);
      const after = job.pending.findIndex((p) => p.kind === 'retract' && p.target === ref);
      if (after >= 0) job.pending.splice(after, 1);
    } else {
      enqueue('retract', {}, ref);
    }
    save();
  }

  function actionUrl(a) {
    return a.kind === 'open' ? 'api/v1/sessions'
      : 'api/v1/sessions/' + encodeURIComponent(job.sessionId) + '/' + ENDPOINTS[a.kind];
  }

  // Sends the queue in order, one at a time, and stops at the first that does not get through.
  async function flush() {
    if (flushing) return;
    flushing = true;
    notice = null;
    setBusy(true);
    try {
      while (job.pending.length > 0) {
        const a = job.pending[0];
        if (a.kind !== 'open' && !job.sessionId) {
          job.pending.shift(); // the opening was refused: nothing to add to
          continue;
        }
        if (a.kind === 'retract' && a.body.retracts === undefined) {
          const seq = job.seqs[a.target];
          if (seq === undefined) {
            job.pending.shift(); // what it would take back was never stored
            continue;
          }
          a.body.retracts = seq;
        }
        a.attempted = true;
        save();
        let r;
        try {
          r = await fetchJson(actionUrl(a), {
            method: 'POST',
            headers: { 'Content-Type': 'application/json', Accept: 'application/json, application/problem+json',
              'Idempotency-Key': a.key },
            body: JSON.stringify(a.body)
          });
        } catch (e) {
          notice = { kind: 'offline' };
          break;
        }
        if (r.ok && r.data && r.data.diagnosis) {
          job.pending.shift();
          stored(a, r.data);
          save();
          continue;
        }
        if (r.status >= 400 && r.status < 500 && r.status !== 408 && r.status !== 429 && r.data) {
          job.pending.shift();
          refused(a, r);
          save();
          break;
        }
        // Not something the technician can correct: keep the queue and let them try again.
        notice = { kind: 'failed', status: r.status, detail: r.data && r.data.detail };
        break;
      }
      if (job.pending.length === 0 && job.wantResult && job.response && job.stage !== 'closed') {
        job.wantResult = false;
        job.stage = 'result';
        save();
        announce(job.response);
        window.scrollTo(0, 0);
        focusSoon('caution-heading');
      }
    } finally {
      flushing = false;
      save();
      setBusy(false);
    }
    if (notice) window.scrollTo(0, 0);
  }

  function stored(a, view) {
    if (a.kind === 'open') {
      job.sessionId = view.id;
      for (const e of view.events || []) {
        if (e.type === 'symptom') job.seqs['open:symptom:' + e.data.symptom] = e.seq;
        if (e.type === 'reading') job.seqs['open:reading:' + e.data.quantity] = e.seq;
      }
    } else if (view.event) {
      job.seqs[a.key] = view.event.seq;
    }
    job.response = view.diagnosis;
    if (a.kind === 'close') {
      job.closure = view.closure;
      job.stage = 'closed';
      job.wantResult = false;
      window.scrollTo(0, 0);
      focusSoon('closed-heading');
    }
  }

  // The service will never take this action: say why, and take back what it stood for on screen.
  function refused(a, r) {
    if (a.kind === 'open') {
      job.sent = null;
      job.pending = [];
      job.wantResult = false;
      if (r.status === 404) {
        notice = { kind: 'unknown-tag', tag: a.body.tag, detail: r.data.detail };
        job.stage = 'tag';
        return;
      }
    } else if (a.kind === 'check') {
      job.checks = job.checks.filter((c) => c.ref !== a.key);
    } else if (a.kind === 'unavailable') {
      job.unavailable = job.unavailable.filter((c) => c.ref !== a.key);
    } else if (job.sent && (a.kind === 'symptom' || a.kind === 'reading')) {
      job.sent = null; // no longer sure what the service holds: the next Diagnose resends all
    }
    notice = { kind: 'problem', problem: r.data, body: a.body };
  }

  // Diagnose on the readings: opens the session, or after that sends what changed since.
  function diagnose() {
    const bad = unreadableReading();
    if (bad) {
      notice = { kind: 'problem', problem: null, errors: [{ field: bad, message: 'that is not a number' }],
        local: true };
      render();
      return;
    }
    if (!job.sessionId && !job.pending.some((p) => p.kind === 'open')) {
      const body = openRequest();
      job.pending.push({ kind: 'open', key: newKey(), body: body, attempted: false });
      job.sent = { symptoms: {}, readings: {} };
      for (const code of body.symptoms.concat(body.absentSymptoms)) {
        job.sent.symptoms[code] = { state: job.symptoms[code], refs: ['open:symptom:' + code] };
      }
      for (const m of body.measurements) {
        job.sent.readings[m.quantity] = { value: m.value, unit: m.unit, refs: ['open:reading:' + m.quantity] };
      }
    } else {
      queueChanges();
    }
    job.wantResult = true;
    notice = null;
    save();
    if (job.pending.length === 0 && job.response) {
      job.wantResult = false;
      go('result');
      return;
    }
    flush();
  }

  // Symptoms and readings changed after the session was opened: send only the differences.
  // "Don't know" or an emptied reading retracts every event that said otherwise.
  function queueChanges() {
    if (!job.sent) job.sent = { symptoms: {}, readings: {} };
    for (const s of vocabulary.symptoms) {
      const now = job.symptoms[s.code] || 'unknown';
      const was = job.sent.symptoms[s.code] || { state: 'unknown', refs: [] };
      if (now === was.state) continue;
      if (now === 'unknown') {
        was.refs.forEach(withdraw);
        was.refs = [];
      } else {
        was.refs.push(enqueue('symptom', { symptom: s.code, present: now === 'present' }));
      }
      was.state = now;
      job.sent.symptoms[s.code] = was;
    }
    for (const q of vocabulary.measurements) {
      const now = readingNow(q);
      const was = job.sent.readings[q.code] || { value: null, unit: null, refs: [] };
      if (now === null ? was.value === null : now.value === was.value && now.unit === was.unit) continue;
      if (now === null) {
        was.refs.forEach(withdraw);
        was.refs = [];
        was.value = null;
        was.unit = null;
      } else {
        was.refs.push(enqueue('reading', now));
        was.value = now.value;
        was.unit = now.unit;
      }
      job.sent.readings[q.code] = was;
    }
  }

  // A reading the service would reject as malformed JSON is caught here, with the reading named.
  function unreadableReading() {
    for (const q of vocabulary.measurements) {
      const r = job.readings[q.code];
      if (r && Number.isNaN(parseNumber(r.value))) return 'reading:' + q.code;
    }
    return null;
  }

  // After the answer is drawn, so the next thing a screen reader reads is the first caution.
  function focusSoon(id) {
    setTimeout(() => {
      const node = $(id);
      if (node && !node.closest('[hidden]')) {
        node.setAttribute('tabindex', '-1');
        node.focus({ preventScroll: true });
      }
    }, 0);
  }

  function setBusy(b) {
    busy = b;
    render();
  }

  function announce(response) {
    const lead = response.hypotheses[0];
    const text = response.nextCheck
      ? 'Next check: ' + response.nextCheck.title + '. Leading cause: ' + lead.title + ', ' + percent(lead.probability) + '.'
      : 'No further check. Leading cause: ' + lead.title + ', ' + percent(lead.probability) + '.';
    $('announce').textContent = text;
  }

  // ---------------------------------------------------------------- actions

  function go(stage) {
    job.stage = stage;
    notice = null;
    save();
    render();
    window.scrollTo(0, 0);
    const heading = document.querySelector('#' + sectionId(stage) + ' h1');
    if (heading) {
      heading.setAttribute('tabindex', '-1');
      heading.focus({ preventScroll: true });
    }
  }

  function sectionId(stage) {
    return STAGES[stage];
  }

  function commitTag() {
    const typed = $('tag').value.trim();
    const known = vocabulary.tagsByUpper[typed.toUpperCase()];
    job.tag = known ? known.tag : typed;
    save();
  }

  function answer(check, outcome) {
    const ref = enqueue('check', { check: check, outcome: outcome });
    job.checks.push({ check: check, outcome: outcome, ref: ref });
    job.acknowledged = null;
    save();
    flush();
  }

  function setAside(check) {
    if (job.unavailable.some((c) => c.check === check)) return;
    const ref = enqueue('unavailable', { check: check });
    job.unavailable.push({ check: check, ref: ref });
    job.acknowledged = null;
    save();
    flush();
  }

  function putBack(check) {
    const item = job.unavailable.find((c) => c.check === check);
    if (!item) return;
    job.unavailable = job.unavailable.filter((c) => c !== item);
    withdraw(item.ref);
    afterChange();
  }

  function undo() {
    if (job.checks.length === 0) return;
    const last = job.checks.pop();
    job.acknowledged = null;
    withdraw(last.ref);
    afterChange();
  }

  // Taking back an answer that was never sent leaves nothing to send: the screen is already right.
  function afterChange() {
    save();
    if (job.pending.length > 0) flush();
    else render();
  }

  function openClose() {
    const f = job.closeForm;
    if (!f.fault && job.response && !job.response.nextCheck && job.response.hypotheses.length) {
      f.fault = job.response.hypotheses[0].fault;
    }
    go('close');
  }

  function sendClose() {
    const f = job.closeForm;
    const errors = [];
    if (!f.fault) errors.push({ field: 'confirmedFault', message: 'pick one, or “Not found”' });
    if (!f.action.trim()) errors.push({ field: 'action', message: 'say what was done, even “nothing”' });
    const mins = parseNumber(f.minutes);
    if (mins === null || Number.isNaN(mins) || mins < 0) errors.push({ field: 'minutes', message: 'a number of minutes, 0 or more' });
    if (errors.length) {
      notice = { kind: 'problem', problem: null, errors: errors, local: true };
      render();
      window.scrollTo(0, 0);
      return;
    }
    if (job.pending.some((p) => p.kind === 'close')) {
      flush();
      return;
    }
    const parts = f.parts.split('\n').map((x) => x.trim()).filter(Boolean);
    const body = { confirmedFault: f.fault, action: f.action.trim(), parts: parts, minutes: mins };
    if (f.remarks.trim()) body.remarks = f.remarks.trim();
    enqueue('close', body);
    flush();
  }

  // Two taps, because one gloved mis-tap must not wipe a night's answers.
  function newJob() {
    const now = Date.now();
    if (now > newJobArmedUntil) {
      newJobArmedUntil = now + 5000;
      render();
      setTimeout(render, 5100);
      return;
    }
    newJobArmedUntil = 0;
    job = freshJob();
    notice = null;
    save();
    go('tag');
  }

  function retry() {
    if (notice && notice.retry) {
      notice.retry();
    } else {
      flush();
    }
  }

  // ---------------------------------------------------------------- drawing

  function el(tag, attrs, children) {
    const node = document.createElement(tag);
    for (const [k, v] of Object.entries(attrs || {})) {
      if (v === null || v === undefined || v === false) continue;
      if (k === 'text') node.textContent = v;
      else if (k === 'onclick') node.addEventListener('click', v);
      else if (k === 'oninput') node.addEventListener('input', v);
      else if (k === 'onchange') node.addEventListener('change', v);
      else if (v === true) node.setAttribute(k, '');
      else node.setAttribute(k, v);
    }
    for (const c of [].concat(children || [])) {
      if (c !== null && c !== undefined) node.append(c);
    }
    return node;
  }

  function render() {
    for (const id of STATIC_CONTROLS) $(id).disabled = false;
    renderHeader();
    renderNotice();
    $('busy').hidden = !busy;
    document.body.classList.toggle('is-busy', busy);
    $('main').setAttribute('aria-busy', busy ? 'true' : 'false');
    $('loading').hidden = vocabulary !== null;
    for (const stage of Object.keys(STAGES)) {
      $(sectionId(stage)).hidden = vocabulary === null || job.stage !== stage;
    }
    renderWaiting();
    if (!vocabulary) return;
    if (job.stage === 'tag') renderTag();
    if (job.stage === 'symptoms') renderSymptoms();
    if (job.stage === 'readings') renderReadings();
    if (job.stage === 'result') renderResult();
    if (job.stage === 'close') renderClose();
    if (job.stage === 'closed') renderClosed();
    for (const b of document.querySelectorAll('button, input, select')) {
      if (busy) b.disabled = true;
    }
  }

  function renderHeader() {
    // "Valve" is for screen readers; the bar is narrow on a tablet held upright.
    $('job-tag').replaceChildren(...(job.tag ? [el('span', { class: 'sr-only', text: 'Valve ' }), job.tag] : []));
    const armed = Date.now() < newJobArmedUntil;
    const nj = $('new-job');
    const unsent = job.pending.length;
    nj.textContent = armed ? (unsent ? 'Tap again: ' + unsent + ' unsent lost' : 'Tap again to clear') : 'New job';
    nj.classList.toggle('danger', armed);
    const light = prefs.theme === 'light';
    document.documentElement.dataset.theme = light ? 'light' : 'dark';
    $('theme').textContent = light ? 'Night mode' : 'Day mode';
    $('theme').setAttribute('aria-pressed', light ? 'true' : 'false');
  }

  function renderNotice() {
    const box = $('notice');
    box.replaceChildren();
    box.className = 'notice';
    if (!notice) {
      if (vocabulary && !busy && job.pending.length > 0) {
        notice = { kind: 'offline' };
      } else {
        box.hidden = true;
        return;
      }
    }
    box.hidden = false;
    if (notice.kind === 'offline') {
      box.classList.add('offline');
      box.append(
        el('p', { class: 'notice-title', text: 'Offline — answers kept, retry' }),
        el('p', { text: 'The service did not answer. Everything you entered is saved on this tablet and is sent,'
          + ' in order, on Retry or when the network is back.' }),
        el('button', { type: 'button', id: 'retry', class: 'btn primary', onclick: retry, disabled: busy, text: 'Retry' }));
    } else if (notice.kind === 'unknown-tag') {
      box.classList.add('problem');
      const tags = vocabulary ? vocabulary.tags.map((t) => t.tag) : [];
      box.append(...[
        el('p', { class: 'notice-title', text: 'Valve “' + notice.tag + '” is not on file' }),
        el('p', { text: 'A job can be opened only on a registered valve. Check the tag plate, or pick one of these:' }),
        tags.length ? el('div', { class: 'tag-choices' }, tags.map((t) => el('button', { type: 'button', class: 'btn small',
          'data-tag': t, onclick: () => { $('tag').value = t; commitTag(); notice = null; render(); }, text: t }))) : null,
        notice.detail ? el('p', { class: 'problem-detail', text: 'Service said: ' + notice.detail }) : null
      ].filter(Boolean));
    } else if (notice.kind === 'failed') {
      box.classList.add('offline');
      box.append(...[
        el('p', { class: 'notice-title', text: 'The service had a problem (HTTP ' + notice.status + ') — answers kept' }),
        notice.detail ? el('p', { text: notice.detail }) : null,
        el('button', { type: 'button', id: 'retry', class: 'btn primary', onclick: retry, disabled: busy, text: 'Retry' })
      ].filter(Boolean));
    } else {
      box.classList.add('problem');
      const errors = notice.problem && notice.problem.errors && notice.problem.errors.length
        ? notice.problem.errors
        : notice.errors || [{ field: notice.problem.field, message: notice.problem.detail }];
      const items = errors.map((e) => {
        const where = e.field && e.field.startsWith('reading:') ? 'Reading “' + readingName(e.field.slice(8)) + '”'
          : fieldInWords(e.field, notice.body);
        return el('li', {}, [el('strong', { text: where + ': ' }), e.message]);
      });
      box.append(el('p', { class: 'notice-title', text: 'Please correct this and try again' }),
        el('ul', { class: 'problem-list' }, items));
      if (notice.problem && notice.problem.detail) {
        box.append(el('p', { class: 'problem-detail' },
          ['Service said: ' + notice.problem.detail + (notice.problem.field ? ' (field ' + notice.problem.field + ')' : '')]));
      }
      if (job.pending.length > 0) {
        box.append(el('button', { type: 'button', id: 'retry', class: 'btn', onclick: retry, disabled: busy,
          text: 'Send the rest' }));
      }
      const aboutReadings = errors.some((e) => e.field && (e.field.startsWith('measurements') || e.field.startsWith('reading:')));
      if (aboutReadings && job.stage !== 'readings') {
        box.append(el('button', { type: 'button', class: 'btn', onclick: () => { const kept = notice; go('readings'); notice = kept; render(); },
          text: 'Go to the readings' }));
      }
    }
  }

  function renderWaiting() {
    const n = job.pending.length;
    const line = $('waiting');
    line.hidden = n === 0;
    line.textContent = n === 1 ? '1 answer waiting to be sent' : n + ' answers waiting to be sent';
  }

  function invalidReadings() {
    const codes = new Set();
    if (!notice || notice.kind !== 'problem') return codes;
    const errors = (notice.problem && notice.problem.errors) || notice.errors || [];
    for (const e of errors) {
      const m = /^measurements\[(\d+)\]/.exec(e.field || '');
      if (m && notice.body && notice.body.measurements[Number(m[1])]) codes.add(notice.body.measurements[Number(m[1])].quantity);
      if ((e.field || '').startsWith('reading:')) codes.add(e.field.slice(8));
    }
    return codes;
  }

  function renderTag() {
    const input = $('tag');
    if (document.activeElement !== input) input.value = job.tag;
    const list = $('tag-list');
    list.replaceChildren(...vocabulary.tags.map((t) => el('option', { value: t.tag, text: t.description || null })));
    const known = vocabulary.tagsByUpper[input.value.trim().toUpperCase()];
    const hint = $('tag-hint');
    if (!input.value.trim()) {
      hint.textContent = 'Valves on file: ' + vocabulary.tags.map((t) => t.tag).join(', ') + '.';
    } else if (known) {
      hint.textContent = known.tag + ': ' + (known.description || 'on file') + '. Its design data will be used.';
    } else {
      hint.textContent = 'Not on file: a job can be opened only on a registered valve ('
        + vocabulary.tags.map((t) => t.tag).join(', ') + ').';
    }
    const wo = $('work-order');
    if (document.activeElement !== wo) wo.value = job.workOrder || '';
    const author = $('author');
    if (document.activeElement !== author) author.value = prefs.author || '';
    // The session is opened already: its valve, work order and author are on record.
    const opened = Boolean(job.sessionId) || job.pending.some((p) => p.kind === 'open');
    for (const id of ['tag', 'work-order', 'author']) $(id).readOnly = opened;
  }

  function renderSymptoms() {
    const box = $('symptom-list');
    box.replaceChildren(...vocabulary.symptoms.map((s) => {
      const state = job.symptoms[s.code] || 'unknown';
      const choice = (value, label) => {
        const id = 'sym-' + s.code + '-' + value;
        return el('span', { class: 'choice' }, [
          el('input', { type: 'radio', id: id, name: 'sym-' + s.code, value: value, checked: state === value,
            onchange: () => {
              if (value === 'unknown') delete job.symptoms[s.code]; else job.symptoms[s.code] = value;
              save();
            } }),
          el('label', { for: id, class: 'choice-' + value, text: label })
        ]);
      };
      return el('fieldset', { class: 'symptom', 'data-symptom': s.code }, [
        el('legend', {}, [el('span', { class: 'symptom-name', text: symptomName(s.code) }),
          el('span', { class: 'symptom-text', text: s.text })]),
        el('div', { class: 'choices' }, [choice('present', 'Seen'), choice('absent', 'Not seen'), choice('unknown', "Don't know")])
      ]);
    }));
  }

  function renderReadings() {
    const invalid = invalidReadings();
    const row = (q) => {
      const r = job.readings[q.code] || {};
      const unit = r.unit || (prefs.units && prefs.units[q.kind] && q.units.includes(prefs.units[q.kind]) ? prefs.units[q.kind] : q.units[0]);
      const inputId = 'reading-' + q.code;
      const unitId = 'unit-' + q.code;
      const bad = invalid.has(q.code);
      // change as well as input: a field emptied by the browser itself (clear, autofill) may fire only change.
      const keep = (ev) => { job.readings[q.code] = { value: ev.target.value, unit: currentUnit(q, unit) }; save(); };
      return el('div', { class: 'reading' + (bad ? ' invalid' : ''), 'data-quantity': q.code }, [
        el('label', { for: inputId, class: 'field-label', text: readingName(q.code) }),
        el('div', { class: 'reading-inputs' }, [
          el('input', { id: inputId, class: 'text-input number', type: 'text', inputmode: 'decimal', autocomplete: 'off',
            value: r.value || '', 'aria-invalid': bad ? 'true' : null,
            oninput: keep, onchange: keep }),
          q.units.length > 1
            ? el('select', { id: unitId, class: 'unit', 'aria-label': 'Unit for ' + readingName(q.code),
              onchange: (ev) => {
                job.readings[q.code] = { value: $(inputId).value, unit: ev.target.value };
                prefs.units = Object.assign({}, prefs.units, { [q.kind]: ev.target.value });
                saveJson(PREFS_KEY, prefs);
                save();
                // One gauge set usually reads in one unit: follow it on the rows not yet filled in.
                for (const other of vocabulary.measurements) {
                  const sel = $('unit-' + other.code);
                  if (other.kind === q.kind && !job.readings[other.code] && sel && sel.tagName === 'SELECT'
                      && other.units.includes(ev.target.value)) {
                    sel.value = ev.target.value;
                  }
                }
              } }, q.units.map((u) => el('option', { value: u, selected: u === unit, text: unitName(u) })))
            : el('span', { id: unitId, class: 'unit fixed', 'data-unit': q.units[0], text: unitName(q.units[0]) })
        ])
      ]);
    };
    const first = vocabulary.measurements.filter((q) => FIRST_READINGS.includes(q.code));
    const more = vocabulary.measurements.filter((q) => !FIRST_READINGS.includes(q.code));
    $('reading-list').replaceChildren(...first.map(row));
    $('reading-list-more').replaceChildren(...more.map(row));
    if (more.some((q) => job.readings[q.code] && job.readings[q.code].value) || more.some((q) => invalid.has(q.code))) {
      $('more-readings').open = true;
    }
  }

  function currentUnit(q, fallback) {
    const sel = $('unit-' + q.code);
    return sel && sel.tagName === 'SELECT' ? sel.value : fallback;
  }

  function renderResult() {
    const r = job.response;
    if (!r) {
      job.stage = 'readings';
      render();
      return;
    }
    const stale = resultIsStale();
    $('result').classList.toggle('stale', stale);
    const next = r.nextCheck;
    const acknowledged = next && job.acknowledged === next.check;

    // Cautions come first: every caution of the response, the check's own included, once each.
    const cautions = [];
    for (const c of [].concat(next ? next.cautions : [], r.cautions || [])) {
      if (!cautions.includes(c)) cautions.push(c);
    }
    const panel = $('caution-panel');
    const bypass = Boolean(next && next.bypassRequired);
    panel.classList.toggle('bypass', bypass);
    $('caution-heading').textContent = bypass ? 'Bypass needed — read before you start' : 'Cautions';
    $('bypass-text').hidden = !bypass;
    $('caution-list').replaceChildren(...cautions.map((c) => el('li', { text: c })));
    $('bypass-ack-label').hidden = !bypass;
    const ack = $('bypass-ack');
    ack.checked = Boolean(acknowledged);
    ack.disabled = stale;
    ack.onchange = () => {
      job.acknowledged = ack.checked && next ? next.check : null;
      save();
      render();
    };

    // The one question.
    $('check-card').hidden = !next;
    $('stop-card').hidden = Boolean(next);
    if (next) {
      const card = $('check-card');
      card.dataset.check = next.check;
      card.dataset.bypass = String(bypass);
      $('check-kind').textContent = bypass ? 'Next check · needs bypass' : 'Next check';
      $('check-minutes').textContent = minutes(next.minutes);
      $('check-title').textContent = next.title;
      $('check-steps').replaceChildren(...next.instructions.map((s) => el('li', { text: s })));
      const locked = stale || (bypass && !acknowledged);
      $('outcome-lock').hidden = !(bypass && !acknowledged);
      $('outcomes').replaceChildren(...next.outcomes.map((o, i) => el('button', {
        type: 'button', class: 'btn outcome' + (i === 0 ? ' usual' : ''), 'data-outcome': o, disabled: locked,
        onclick: () => answer(next.check, o)
      }, [el('span', { text: humanise(o) }), i === 0 && o !== 'normal' ? el('small', { text: 'the normal result' }) : null])));
      $('cant-do').disabled = stale;
      $('cant-do').onclick = () => setAside(next.check);
      $('check-why').textContent = plain(next.why);
    } else {
      const lead = r.hypotheses[0];
      const reason = r.decision && r.decision.stopReason
        ? r.decision.stopReason
        : 'The leading cause is clear enough to act on.';
      $('stop-title').textContent = lead.title + ' — ' + percent(lead.probability);
      $('stop-reason').textContent = plain(reason);
      $('stop-action').textContent = lead.action || 'Act on this cause within your site procedures.';
    }

    // Answers so far, with undo of the last one.
    $('answer-list').replaceChildren(...job.checks.map((c) => el('li', {}, [
      el('span', { class: 'answer-check', text: checkTitle(c.check) }), ' — ', el('strong', { text: humanise(c.outcome) })])));
    $('no-answers').hidden = job.checks.length > 0;
    $('undo').disabled = job.checks.length === 0;
    $('undo').onclick = undo;
    $('edit-start').onclick = () => go('symptoms');
    $('set-aside').hidden = job.unavailable.length === 0;
    $('set-aside-list').replaceChildren(...job.unavailable.map((c) => el('li', {}, [
      el('span', { text: checkTitle(c.check) }),
      el('button', { type: 'button', class: 'btn small', onclick: () => putBack(c.check), disabled: stale,
        text: 'Put back' })])));
    $('close-job').onclick = openClose;
    $('stop-close').onclick = openClose;
    $('close-job').disabled = stale;
    $('stop-close').disabled = stale;

    // Ranked causes.
    $('cause-list').replaceChildren(...r.hypotheses.slice(0, TOP_CAUSES).map((h) => {
      const pct = Math.max(0, Math.min(1, h.probability)) * 100;
      return el('li', { class: 'cause', 'data-fault': h.fault }, [
        el('div', { class: 'cause-head' }, [
          el('span', { class: 'cause-title', text: h.title }),
          el('span', { class: 'cause-pct', text: percent(h.probability) })]),
        el('div', { class: 'prob', 'aria-hidden': 'true' }, [el('span', { style: 'width:' + pct.toFixed(1) + '%' })]),
        el('p', { class: 'cause-code' }, ['ISO 14224 failure mode ', el('b', { text: h.failureMode }),
          h.mechanism ? ' · mechanism ' + h.mechanism : '']),
        el('details', { class: 'reasons' }, [
          el('summary', { text: h.reasons.length ? 'Reasons (' + h.reasons.length + ')' : 'Reasons' }),
          h.reasons.length
            ? el('ul', {}, h.reasons.map((x) => el('li', { text: plain(x) })))
            : el('p', { text: 'Nothing reported points to it directly; it ranks here on how often it happens.' }),
          h.action ? el('p', { class: 'action' }, [el('b', { text: 'If confirmed: ' }), h.action]) : null])
      ]);
    }));

    const findings = r.findings || [];
    $('findings-count').textContent = '(' + findings.length + ')';
    $('finding-list').replaceChildren(...(findings.length ? findings.map((f) => el('li', { text: plain(f.text) }))
      : [el('li', { text: 'No reading gave a finding yet.' })]));
    const assumptions = r.assumptions || [];
    $('assumptions-count').textContent = '(' + assumptions.length + ')';
    $('assumption-list').replaceChildren(...assumptions.map((a) => el('li', { text: plain(a) })));
  }

  function renderClose() {
    const f = job.closeForm;
    const r = job.response;
    const causes = (r ? r.hypotheses.slice(0, TOP_CAUSES) : []).map((h) => ({ code: h.fault,
      label: h.title + ' — ' + percent(h.probability) }));
    causes.push({ code: NOT_FOUND, label: 'Not found: no cause confirmed' });
    if (f.fault && !causes.some((c) => c.code === f.fault)) {
      const known = vocabulary.faultsByCode[f.fault];
      causes.unshift({ code: f.fault, label: known ? known.title : humanise(f.fault) });
    }
    $('close-causes').replaceChildren(...causes.map((c) => {
      const id = 'cause-' + c.code;
      return el('span', { class: 'choice pick' }, [
        el('input', { type: 'radio', id: id, name: 'confirmed-cause', value: c.code, checked: f.fault === c.code,
          onchange: () => { f.fault = c.code; save(); } }),
        el('label', { for: id, class: 'choice-unknown', text: c.label })]);
    }));
    for (const [id, field] of [['close-action', 'action'], ['close-parts', 'parts'], ['close-minutes', 'minutes'],
      ['close-remarks', 'remarks']]) {
      const input = $(id);
      if (document.activeElement !== input) input.value = f[field];
      input.oninput = () => { f[field] = input.value; save(); };
    }
    $('close-back').onclick = () => go('result');
    $('close-send').onclick = sendClose;
  }

  function renderClosed() {
    const c = job.closure;
    if (!c) return;
    const row = (id, label, value) => [el('dt', { text: label }), el('dd', { id: id, text: value })];
    const when = c.closedAt ? new Date(c.closedAt).toLocaleString() : '';
    $('closure-record').dataset.session = c.sessionId;
    $('closure-record').replaceChildren(...[
      row('closure-tag', 'Valve', c.tag + (c.site ? ' (' + c.site + ')' : '')),
      c.workOrder ? row('closure-work-order', 'Work order', c.workOrder) : [],
      row('closure-fault', 'Confirmed cause', c.faultTitle || humanise(c.confirmedFault)),
      row('closure-mode', 'ISO 14224 failure mode', c.failureMode),
      row('closure-mechanism', 'Failure mechanism', c.failureMechanism),
      row('closure-cause', 'Failure cause', c.failureCause),
      row('closure-action', 'What was done', c.action),
      row('closure-parts', 'Parts used', c.parts && c.parts.length ? c.parts.join('; ') : 'none'),
      row('closure-minutes', 'Minutes spent', String(c.minutes)),
      c.remarks ? row('closure-remarks', 'Remarks', c.remarks) : [],
      row('closure-by', 'Closed by', c.closedBy + (when ? ', ' + when : '')),
      row('closure-session', 'Job record', c.sessionId)
    ].flat());
    $('print').onclick = () => window.print();
  }

  // ---------------------------------------------------------------- wiring

  function wire() {
    $('tag').addEventListener('input', () => { commitTag(); renderTag(); renderHeader(); });
    $('tag').addEventListener('keydown', (ev) => { if (ev.key === 'Enter') $('to-symptoms').click(); });
    $('work-order').addEventListener('input', () => { job.workOrder = $('work-order').value.trim(); save(); });
    $('author').addEventListener('input', () => { prefs.author = $('author').value.trim(); saveJson(PREFS_KEY, prefs); });
    $('to-symptoms').addEventListener('click', () => {
      if (!$('tag').readOnly) commitTag();
      if (!job.tag) {
        $('tag-hint').textContent = 'Enter the valve tag first: the record of this job needs it.';
        $('tag').focus();
        return;
      }
      if (!prefs.author) {
        $('author-hint').textContent = 'Enter your name first: the record of this job needs it.';
        $('author').focus();
        return;
      }
      go('symptoms');
    });
    $('back-to-tag').addEventListener('click', () => go('tag'));
    $('to-readings').addEventListener('click', () => go('readings'));
    $('back-to-symptoms').addEventListener('click', () => go('symptoms'));
    $('diagnose').addEventListener('click', diagnose);
    $('new-job').addEventListener('click', newJob);
    $('theme').addEventListener('click', () => {
      prefs.theme = prefs.theme === 'light' ? 'dark' : 'light';
      saveJson(PREFS_KEY, prefs);
      renderHeader();
    });
    // Back on the network: send what waited, in order, without waiting for a tap.
    window.addEventListener('online', () => { if (vocabulary && job.pending.length > 0) flush(); });
    // Another tab on the same tablet changed the job: follow it rather than overwrite it later.
    window.addEventListener('storage', (ev) => {
      if (ev.key === JOB_KEY) {
        job = loadJson(JOB_KEY) || freshJob();
        render();
      }
    });
  }

  function start() {
    if (!job || job.version !== 2) job = freshJob();
    wire();
    render();
    loadVocabulary();
    if ('serviceWorker' in navigator && window.isSecureContext) {
      navigator.serviceWorker.register('sw.js').catch(() => { /* the page works without it, only not from cold offline */ });
    }
  }

  if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
  else start();
}());
