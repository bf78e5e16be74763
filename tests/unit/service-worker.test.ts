import fs from 'node:fs';
import path from 'node:path';
import vm from 'node:vm';
import { describe, expect, it } from 'vitest';

// The service worker (src/public/sw.js) run in a sandbox: its own code, with the browser's cache storage and network
// played by small fakes (an invented build of three files).
const ORIGIN = 'https://trayline.test';
const source = fs.readFileSync(path.resolve(__dirname, '../../src/public/sw.js'), 'utf8');

type Req = { url: string; method: string; mode: string };
const keyOf = (r: string | Req) => new URL(typeof r === 'string' ? r : r.url, ORIGIN).href;

class FakeCache {
  entries = new Map<string, Response>();
  async match(r: string | Req) {
    return this.entries.get(keyOf(r))?.clone();
  }
  async put(r: string | Req, answer: Response) {
    this.entries.set(keyOf(r), answer.clone());
  }
  async keys() {
    return [...this.entries.keys()];
  }
  async addAll(urls: string[]) {
    for (const u of urls) {
      const answer = await this.network(u);
      if (!answer.ok) throw new TypeError(`addAll: ${u} ${answer.status}`);
      await this.put(u, answer);
    }
  }
  constructor(private network: (r: string | Req) => Promise<Response>) {}
}

class FakeCaches {
  named = new Map<string, FakeCache>();
  constructor(private network: (r: string | Req) => Promise<Response>) {}
  async open(name: string) {
    if (!this.named.has(name)) this.named.set(name, new FakeCache(this.network));
    return this.named.get(name)!;
  }
  async has(name: string) {
    return this.named.has(name);
  }
  async delete(name: string) {
    return this.named.delete(name);
  }
  async keys() {
    return [...this.named.keys()];
  }
  async match(r: string | Req, opts: { cacheName?: string } = {}) {
    const names = opts.cacheName ? [opts.cacheName] : [...this.named.keys()];
    for (const n of names) {
      const hit = await this.named.get(n)?.match(r);
      if (hit) return hit;
    }
    return undefined;
  }
}

/** A server with one build on it (`files`: path → body), or none at all (offline). */
function world(build: { page: string; files: Record<string, string> }) {
  const state = { online: true, build, asked: [] as string[] };
  const network = async (r: string | Req) => {
    const url = new URL(keyOf(r));
    state.asked.push(url.pathname);
    if (!state.online) throw new TypeError('Failed to fetch');
    const b = state.build;
    if (url.pathname === '/asset-manifest.json') {
      const manifest = Object.fromEntries(Object.keys(b.files).map((f) => [f, { file: f.slice(1) }]));
      return new Response(JSON.stringify(manifest), { headers: { 'content-type': 'application/json' } });
    }
    if (b.files[url.pathname]) return new Response(b.files[url.pathname], { headers: { 'content-type': 'text/javascript' } });
    if (url.pathname.startsWith('/assets/')) return new Response(b.page, { headers: { 'content-type': 'text/html' } }); // a careless server
    return new Response(b.page, { headers: { 'content-type': 'text/html; charset=utf-8' } });
  };
  const caches = new FakeCaches(network);
  const handlers: Record<string, (e: unknown) => void> = {};
  const self = {
    location: { origin: ORIGIN },
    addEventListener: (type: string, fn: (e: unknown) => void) => (handlers[type] = fn),
    skipWaiting: () => undefined,
    clients: { claim: async () => undefined },
  };
  vm.runInNewContext(source, { self, caches, fetch: network, Response, URL, Set, Object, Date, Math, console });

  async function lifecycle(type: 'install' | 'activate') {
    const waits: Promise<unknown>[] = [];
    handlers[type]({ waitUntil: (p: Promise<unknown>) => waits.push(p) });
    await Promise.all(waits);
  }
  /** A request through the worker: its answer, or null when the worker leaves it to the browser. */
  async function ask(pathname: string, mode = 'cors', method = 'GET') {
    let answer: Promise<Response> | null = null;
    const waits: Promise<unknown>[] = [];
    handlers.fetch({ request: { url: ORIGIN + pathname, method, mode }, respondWith: (p: Promise<Response>) => (answer = p), waitUntil: (p: Promise<unknown>) => waits.push(p) });
    const got = answer ? await answer : null;
    await Promise.all(waits);
    return got as Response | null;
  }
  const kept = async (name: string) => ((await caches.has(name)) ? (await (await caches.open(name)).keys()).map((k) => new URL(k).pathname).sort() : []);
  return { state, lifecycle, ask, kept, caches };
}

const buildA = { page: '<script src="/assets/index-A.js"></script>', files: { '/assets/index-A.js': 'a', '/assets/my-plates-A.js': 'pa', '/assets/font-A.woff2': 'f' } };
const buildB = { page: '<script src="/assets/index-B.js"></script>', files: { '/assets/index-B.js': 'b', '/assets/my-plates-B.js': 'pb' } };

describe('the service worker', () => {
  it("keeps the page and every file of the build when installed, then opens pages without a network from them", async () => {
    const w = world(buildA);
    await w.lifecycle('install');
    await w.lifecycle('activate');
    expect(await w.kept('trayline-page-v1')).toEqual(['/']);
    expect(await w.kept('trayline-files-v1')).toEqual(['/assets/font-A.woff2', '/assets/index-A.js', '/assets/my-plates-A.js']);
    w.state.online = false;
    const page = await w.ask('/my-plates', 'navigate');
    expect(await page!.text()).toBe(buildA.page);
    const code = await w.ask('/assets/my-plates-A.js');
    expect(await code!.text()).toBe('pa');
  });

  it('asks the network first for a page, and leaves the API, other methods and other sites to the browser', async () => {
    const w = world(buildA);
    await w.lifecycle('install');
    w.state.asked = [];
    await w.ask('/weeks/3', 'navigate');
    expect(w.state.asked[0]).toBe('/weeks/3');
    expect(await w.ask('/api/weeks/mine?today=2026-01-07')).toBeNull();
    expect(await w.ask('/api/plans/mine.pdf', 'navigate')).toBeNull();
    expect(await w.ask('/assets/index-A.js', 'cors', 'POST')).toBeNull();
    w.state.asked = [];
    // A kept file is never asked again (its name is its content's hash).
    await w.ask('/assets/index-A.js');
    expect(w.state.asked).toEqual([]);
  });

  it("takes a new build's files in place of the old ones when its page is first seen", async () => {
    const w = world(buildA);
    await w.lifecycle('install');
    w.state.build = buildB;
    const page = await w.ask('/', 'navigate');
    expect(await page!.text()).toBe(buildB.page);
    expect(await w.kept('trayline-files-v1')).toEqual(['/assets/index-B.js', '/assets/my-plates-B.js']);
    w.state.online = false;
    expect(await (await w.ask('/my-plates', 'navigate'))!.text()).toBe(buildB.page);
    expect((await w.caches.keys()).sort()).toEqual(['trayline-files-v1', 'trayline-page-v1']);
  });

  it('never keeps a page in place of a missing file, and without a network and nothing kept it fails as the browser would', async () => {
    const w = world(buildA);
    const missing = await w.ask('/assets/gone-Z.js');
    expect(missing!.headers.get('content-type')).toContain('text/html');
    expect(await w.kept('trayline-files-v1')).not.toContain('/assets/gone-Z.js');
    const fresh = world(buildA);
    fresh.state.online = false;
    await fresh.lifecycle('install'); // installed offline: nothing kept, nothing broken
    await expect(fresh.ask('/my-plates', 'navigate')).rejects.toThrow('Failed to fetch');
  });
});
