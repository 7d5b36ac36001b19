// Positioner job sheet: the technician's page. Plain script, no build step and nothing fetched from
// elsewhere, because the tablet may be on a plant network that reaches only this server.
//
// The whole job lives in one object that is saved to localStorage after every change, so a
// reload, a flat battery or dropped Wi-Fi loses no answer. The screen is redrawn from it.
'use strict';

(function () {
  const JOB_KEY = 'positioner-job.job.v1';
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
  const STATIC_CONTROLS = ['tag', 'to-symptoms', 'back-to-tag', 'to-readings', 'back-to-symptoms', 'diagnose', 'theme',
    'new-job', 'cant-do', 'undo', 'edit-start', 'bypass-ack'];

  const FIELD_PARTS = { value: 'the number', unit: 'the unit', quantity: 'the reading', check: 'the check',
    outcome: 'the answer' };

  let vocabulary = null;
  let job = loadJson(JOB_KEY) || freshJob();
  let prefs = loadJson(PREFS_KEY) || {};
  let busy = false;
  let notice = null;
  let newJobArmedUntil = 0;

  const $ = (id) => document.getElementById(id);

  // ---------------------------------------------------------------- state and storage

  function freshJob() {
    return { version: 1, stage: 'tag', tag: '', symptoms: {}, readings: {}, checks: [], unavailable: [],
      acknowledged: null, response: null, responseFor: null };
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

  function diagnosisRequest() {
    const present = [];
    const absent = [];
    for (const s of vocabulary.symptoms) {
      if (job.symptoms[s.code] === 'present') present.push(s.code);
      if (job.symptoms[s.code] === 'absent') absent.push(s.code);
    }
    const measurements = [];
    for (const q of vocabulary.measurements) {
      const r = job.readings[q.code];
      if (!r) continue;
      const value = parseNumber(r.value);
      if (value === null) continue;
      measurements.push({ quantity: q.code, value: value, unit: r.unit || q.units[0] });
    }
    const body = { symptoms: present, absentSymptoms: absent, measurements: measurements,
      checks: job.checks.slice(), unavailableChecks: job.unavailable.slice() };
    if (job.tag) body.asset = { tag: job.tag };
    return body;
  }

  // The shown result is stale when the answers changed after it came back (e.g. tapped offline).
  function resultIsStale() {
    return job.response !== null && job.responseFor !== JSON.stringify(diagnosisRequest());
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
    if (field === 'asset.tag') return 'Valve tag';
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
    if (vocabulary && job.stage === 'result' && resultIsStale()) {
      diagnose();
    }
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

  async function diagnose() {
    const bad = unreadableReading();
    if (bad) {
      notice = { kind: 'problem', problem: null, errors: [{ field: bad, message: 'that is not a number' }],
        local: true };
      render();
      return;
    }
    const body = diagnosisRequest();
    const sent = JSON.stringify(body);
    notice = null;
    if (job.response && job.responseFor === sent) {
      // The answer on screen is already the one for exactly this request (the service is a pure
      // function of it), e.g. after undoing an answer that was tapped while offline.
      job.stage = 'result';
      save();
      render();
      return;
    }
    setBusy(true);
    try {
      const r = await fetchJson('api/v1/diagnoses', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Accept: 'application/json, application/problem+json' },
        body: sent
      });
      if (r.ok && r.data && Array.isArray(r.data.hypotheses)) {
        job.response = r.data;
        job.responseFor = sent;
        if (job.stage !== 'result') job.stage = 'result';
        save();
        announce(r.data);
        window.scrollTo(0, 0);
        focusSoon('caution-heading');
      } else if (r.status === 400 && r.data && (r.data.detail || r.data.errors)) {
        notice = { kind: 'problem', problem: r.data, body: body };
      } else {
        // Not something the technician can correct: keep the answers and let them try again.
        notice = { kind: 'failed', status: r.status, detail: r.data && r.data.detail };
      }
    } catch (e) {
      notice = { kind: 'offline', retry: diagnose };
    } finally {
      setBusy(false);
    }
    if (notice) window.scrollTo(0, 0);
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
    return { tag: 'step-tag', symptoms: 'step-symptoms', readings: 'step-readings', result: 'result' }[stage];
  }

  function commitTag() {
    const typed = $('tag').value.trim();
    const known = vocabulary.tagsByUpper[typed.toUpperCase()];
    job.tag = known ? known.tag : typed;
    save();
  }

  function answer(check, outcome) {
    job.checks.push({ check: check, outcome: outcome });
    job.acknowledged = null;
    save();
    diagnose();
  }

  function setAside(check) {
    if (!job.unavailable.includes(check)) job.unavailable.push(check);
    job.acknowledged = null;
    save();
    diagnose();
  }

  function putBack(check) {
    job.unavailable = job.unavailable.filter((c) => c !== check);
    save();
    diagnose();
  }

  function undo() {
    if (job.checks.length === 0) return;
    job.checks.pop();
    job.acknowledged = null;
    save();
    diagnose();
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
      diagnose();
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
    for (const stage of ['tag', 'symptoms', 'readings', 'result']) {
      $(sectionId(stage)).hidden = vocabulary === null || job.stage !== stage;
    }
    if (!vocabulary) return;
    if (job.stage === 'tag') renderTag();
    if (job.stage === 'symptoms') renderSymptoms();
    if (job.stage === 'readings') renderReadings();
    if (job.stage === 'result') renderResult();
    for (const b of document.querySelectorAll('button, input, select')) {
      if (busy) b.disabled = true;
    }
  }

  function renderHeader() {
    // "Valve" is for screen readers; the bar is narrow on a tablet held upright.
    $('job-tag').replaceChildren(...(job.tag ? [el('span', { class: 'sr-only', text: 'Valve ' }), job.tag] : []));
    const armed = Date.now() < newJobArmedUntil;
    const nj = $('new-job');
    nj.textContent = armed ? 'Tap again to clear' : 'New job';
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
      if (vocabulary && job.stage === 'result' && !busy && resultIsStale()) {
        notice = { kind: 'offline', retry: diagnose };
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
        el('p', { text: 'The service did not answer. Everything you entered is saved on this tablet.' }),
        el('button', { type: 'button', id: 'retry', class: 'btn primary', onclick: retry, disabled: busy, text: 'Retry' }));
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
      const aboutReadings = errors.some((e) => e.field && (e.field.startsWith('measurements') || e.field.startsWith('reading:')));
      if (aboutReadings && job.stage !== 'readings') {
        box.append(el('button', { type: 'button', class: 'btn', onclick: () => { const kept = notice; go('readings'); notice = kept; render(); },
          text: 'Go to the readings' }));
      }
    }
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
      hint.textContent = 'Not on file: the service will assume typical values and say so.';
    }
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
      return el('div', { class: 'reading' + (bad ? ' invalid' : ''), 'data-quantity': q.code }, [
        el('label', { for: inputId, class: 'field-label', text: readingName(q.code) }),
        el('div', { class: 'reading-inputs' }, [
          el('input', { id: inputId, class: 'text-input number', type: 'text', inputmode: 'decimal', autocomplete: 'off',
            value: r.value || '', 'aria-invalid': bad ? 'true' : null,
            oninput: (ev) => { job.readings[q.code] = { value: ev.target.value, unit: currentUnit(q, unit) }; save(); } }),
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
      el('span', { text: checkTitle(c) }),
      el('button', { type: 'button', class: 'btn small', onclick: () => putBack(c), text: 'Put back' })])));

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

  // ---------------------------------------------------------------- wiring

  function wire() {
    $('tag').addEventListener('input', () => { commitTag(); renderTag(); renderHeader(); });
    $('tag').addEventListener('keydown', (ev) => { if (ev.key === 'Enter') $('to-symptoms').click(); });
    $('to-symptoms').addEventListener('click', () => {
      commitTag();
      if (!job.tag) {
        $('tag-hint').textContent = 'Enter the valve tag first: the record of this job needs it.';
        $('tag').focus();
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
    // Another tab on the same tablet changed the job: follow it rather than overwrite it later.
    window.addEventListener('storage', (ev) => {
      if (ev.key === JOB_KEY) {
        job = loadJson(JOB_KEY) || freshJob();
        render();
      }
    });
  }

  function start() {
    if (!job || job.version !== 1) job = freshJob();
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
