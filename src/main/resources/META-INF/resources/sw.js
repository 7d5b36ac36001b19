// Keeps the page itself (not the answers: those are in localStorage) so the tablet can reopen it
// when Wi-Fi drops. Network first, so a new version reaches the tablet as soon as it is online;
// only the page's own files are handled: never the API, because a stale diagnosis must not look
// like a fresh one.
'use strict';
const CACHE = 'positioner-job-page-v2';
const PAGE = ['./', 'index.html', 'app.js', 'app.css'];

self.addEventListener('install', (event) => {
  event.waitUntil(caches.open(CACHE).then((c) => c.addAll(PAGE)).then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(caches.keys()
    .then((keys) => Promise.all(keys.filter((k) => k !== CACHE).map((k) => caches.delete(k))))
    .then(() => self.clients.claim()));
});

self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url);
  const page = PAGE.map((p) => new URL(p, self.registration.scope).pathname);
  if (event.request.method !== 'GET' || url.origin !== self.location.origin || !page.includes(url.pathname)) {
    return;
  }
  // Revalidate with the server (a 304 costs little): the server marks page files cacheable for a
  // day, and a tablet must not keep last week's page while it is online.
  event.respondWith(fetch(event.request.url, { cache: 'no-cache', credentials: 'same-origin' })
    .then((response) => {
      if (response.ok) {
        const copy = response.clone();
        caches.open(CACHE).then((c) => c.put(event.request, copy));
      }
      return response;
    })
    .catch(() => caches.match(event.request).then((hit) => hit || caches.match('index.html'))));
});
