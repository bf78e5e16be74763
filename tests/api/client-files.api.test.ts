import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../support/test-app.js';

// The built client as the server hands it out (SERVE_CLIENT=1): a throwaway build folder of two files.
const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'trayline-dist-'));
let app: Awaited<ReturnType<typeof testApp>>;

beforeAll(async () => {
  fs.mkdirSync(path.join(dist, 'assets'));
  fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Trayline</title><div id="root"></div>');
  fs.writeFileSync(path.join(dist, 'assets', 'index-abc123.js'), 'export const built = 1;');
  fs.writeFileSync(path.join(dist, 'sw.js'), 'self.addEventListener("fetch", () => {});');
  app = await testApp({ SERVE_CLIENT: '1', CLIENT_DIST: dist });
});

afterAll(async () => {
  await app.mail.stop().catch(() => undefined);
  await Promise.allSettled([app.orm.close(true), app.pool.end()]);
  fs.rmSync(dist, { recursive: true, force: true });
});

describe('the built client', () => {
  it("answers any page's address with the app's page, and a built file with itself", async () => {
    const page = await request(app.app).get('/weeks/12/shopping');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/^text\/html/);
    expect(page.text).toContain('<div id="root">');
    const code = await request(app.app).get('/assets/index-abc123.js');
    expect(code.status).toBe(200);
    expect(code.headers['content-type']).toMatch(/javascript/);
    const worker = await request(app.app).get('/sw.js');
    expect(worker.status).toBe(200);
    expect(worker.headers['content-type']).toMatch(/javascript/);
  });

  it("answers a built file that is not there (an earlier build's, after a deploy) with a 404, never the app's page", async () => {
    const gone = await request(app.app).get('/assets/week.route-old999.js');
    expect(gone.status).toBe(404);
    expect(gone.headers['content-type']).not.toMatch(/html/);
  });
});
