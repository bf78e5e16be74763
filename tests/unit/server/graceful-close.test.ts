import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterEach, describe, expect, it } from 'vitest';
import { gracefulClose } from '@server/lib/graceful-close.js';

const open: http.Server[] = [];
afterEach(() => {
  for (const s of open.splice(0)) {
    if (!s.listening) continue;
    s.closeAllConnections();
    s.close();
  }
});

/** A server whose handler is given; resolves once it listens on a free loopback port. */
async function serve(handler: http.RequestListener): Promise<{ server: http.Server; url: string }> {
  const server = http.createServer(handler);
  open.push(server);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  return { server, url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/` };
}

/** GET on a kept-alive connection: status and body, or the error the client saw. */
function get(url: string, agent: http.Agent): Promise<{ status?: number; body?: string; error?: string }> {
  return new Promise((resolve) => {
    http
      .get(url, { agent }, (res) => {
        let body = '';
        res.on('data', (c) => (body += c));
        res.on('end', () => resolve({ status: res.statusCode, body }));
        res.on('error', (e) => resolve({ error: e.message }));
      })
      .on('error', (e) => resolve({ error: e.message }));
  });
}

describe('graceful close', () => {
  it('lets a request in flight finish, then resolves', async () => {
    let reached!: () => void;
    const inHandler = new Promise<void>((r) => (reached = r));
    const { server, url } = await serve((_req, res) => {
      reached();
      setTimeout(() => res.end('saved'), 300);
    });
    const agent = new http.Agent({ keepAlive: true });
    const answer = get(url, agent);
    await inHandler;
    const t = performance.now();
    const closed = await gracefulClose(server, 5000);
    expect(closed).toEqual({ cut: false });
    expect(performance.now() - t).toBeGreaterThanOrEqual(250);
    expect(await answer).toEqual({ status: 200, body: 'saved' });
    expect(server.listening).toBe(false);
    agent.destroy();
  });

  it('closes an idle kept-alive connection at once instead of waiting for its keep-alive timeout', async () => {
    const { server, url } = await serve((_req, res) => res.end('ok'));
    server.keepAliveTimeout = 30_000;
    const agent = new http.Agent({ keepAlive: true });
    expect(await get(url, agent)).toEqual({ status: 200, body: 'ok' });
    const t = performance.now();
    expect(await gracefulClose(server, 10_000)).toEqual({ cut: false });
    expect(performance.now() - t).toBeLessThan(2000);
    agent.destroy();
  });

  it('cuts a request still running after the grace period', async () => {
    const { server, url } = await serve(() => {
      /* never answers */
    });
    const agent = new http.Agent({ keepAlive: true });
    const answer = get(url, agent);
    await new Promise((r) => setTimeout(r, 50));
    expect(await gracefulClose(server, 200)).toEqual({ cut: true });
    expect((await answer).error).toMatch(/socket hang up|ECONNRESET/);
    agent.destroy();
  });

  it('does nothing for a server that is not listening', async () => {
    expect(await gracefulClose(http.createServer(), 100)).toEqual({ cut: false });
  });
});
