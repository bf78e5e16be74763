// Trayline's service worker: lets the app open without a network (a client's plates on a phone in a kitchen with no
// signal). It keeps the page itself (index.html) and the build's files (/assets/…), nothing else: the API's answers
// never pass through here (pages keep their own copies of what must open offline, src/lib/device-copy.ts), so
// nobody's data sits in this cache and every request to /api/ goes to the server as it is.
//
// - A page (a navigation, any path outside /api/): the network first; its answer is kept as "the page". Without a
//   network, the kept page answers (the router then shows the path asked for).
// - The build's files: all of them kept as soon as a build's page is (the list is the build's asset-manifest.json,
//   written by Vite), so a page never visited online still opens offline. A new build (a page that differs from the
//   kept one) replaces them: the cache holds one build's files.
// - A built file (/assets/…, named by its content's hash, so it never changes): the kept copy, else the network's,
//   kept as it passes.
// Plain JavaScript with no imports, copied as it is into the build's root (src/public/): a worker's scope is the
// folder it is served from, so it must be /sw.js to cover every page.

const PAGE_CACHE = 'trayline-page-v1';
const FILE_CACHE = 'trayline-files-v1';
const PAGE_KEY = '/';
const FILE_LIST = '/asset-manifest.json';

self.addEventListener('install', (event) => {
  // A new worker takes over at once (it keeps nothing the old one needs), with this build's page and files kept.
  self.skipWaiting();
  event.waitUntil(
    (async () => {
      try {
        const answer = await fetch(PAGE_KEY, { cache: 'no-cache' });
        if (answer.ok) await keepPage(answer);
      } catch {
        // Installed without a network: the first page opened online keeps them.
      }
    })(),
  );
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    (async () => {
      const keep = new Set([PAGE_CACHE, FILE_CACHE]);
      for (const name of await caches.keys()) if (name.startsWith('trayline-') && !keep.has(name)) await caches.delete(name);
      await self.clients.claim();
    })(),
  );
});

self.addEventListener('fetch', (event) => {
  const request = event.request;
  if (request.method !== 'GET') return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || url.pathname.startsWith('/api/')) return;
  if (request.mode === 'navigate') event.respondWith(page(request, event));
  else if (url.pathname.startsWith('/assets/')) event.respondWith(builtFile(request));
});

async function page(request, event) {
  let answer;
  try {
    answer = await fetch(request);
  } catch (offline) {
    const kept = await caches.match(PAGE_KEY, { cacheName: PAGE_CACHE });
    if (kept) return kept;
    throw offline;
  }
  const type = answer.headers.get('content-type') ?? '';
  if (answer.ok && type.includes('text/html')) {
    const keeping = keepPage(answer.clone());
    event.waitUntil(keeping.catch(() => undefined));
  }
  return answer;
}

/** Keeps a build's page; a page unlike the kept one (another build) brings that build's files in place of the old. */
async function keepPage(answer) {
  const text = await answer.text();
  const pages = await caches.open(PAGE_CACHE);
  const kept = await pages.match(PAGE_KEY);
  if (kept && (await kept.text()) === text && (await caches.has(FILE_CACHE))) return;
  const list = await fetch(FILE_LIST, { cache: 'no-cache' });
  if (!list.ok) return;
  const files = new Set();
  for (const chunk of Object.values(await list.json())) {
    for (const f of [chunk.file, ...(chunk.css ?? []), ...(chunk.assets ?? [])]) if (f && f.startsWith('assets/')) files.add(`/${f}`);
  }
  // Filled under another name and swapped in whole: a file cache is never half one build, half another.
  const filling = `trayline-filling-${Date.now()}-${Math.random()}`;
  const next = await caches.open(filling);
  await next.addAll([...files]);
  await caches.delete(FILE_CACHE);
  const fresh = await caches.open(FILE_CACHE);
  for (const key of await next.keys()) await fresh.put(key, await next.match(key));
  await caches.delete(filling);
  await pages.put(PAGE_KEY, new Response(text, { headers: { 'content-type': answer.headers.get('content-type') ?? 'text/html' } }));
}

async function builtFile(request) {
  const kept = await caches.match(request, { cacheName: FILE_CACHE });
  if (kept) return kept;
  const answer = await fetch(request);
  // Never a page kept as code (a server that answers a missing file with its page).
  if (answer.ok && !(answer.headers.get('content-type') ?? '').includes('text/html')) {
    const files = await caches.open(FILE_CACHE);
    await files.put(request, answer.clone());
  }
  return answer;
}
