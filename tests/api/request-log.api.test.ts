import { Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import pino from 'pino';
import { loadEnv } from '@server/config/env.js';
import { createApp } from '@server/app.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace } from '../support/factories.js';
import { TEST_DATABASE_URL } from '../support/db.js';

describe('request log', () => {
  it('writes a line per request with its status, and never the session cookie', async () => {
    const { orm, pool, mail } = await testApp();
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk, _enc, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: TEST_DATABASE_URL, LOG_LEVEL: 'info', SERVE_CLIENT: '0', DEMO_SEED: '0', PUBLIC_URL: 'http://127.0.0.1:8080' });
    const app = createApp({ orm, pool, env, mail, logger: pino({ level: 'info' }, sink) });
    // Registering signs the coach in (a Set-Cookie), and the agent sends the cookie back on the next request.
    const coach = await coachWorkspace(app);
    await coach.agent.get('/api/auth/me').expect(200);
    const done = lines.map((l) => JSON.parse(l)).filter((l) => l.msg === 'request completed');
    expect(done.length).toBeGreaterThanOrEqual(2);
    expect(done.map((l) => l.res)).toContainEqual({ statusCode: 200 });
    const all = lines.join('\n');
    expect(all).not.toContain('trayline.sid');
    expect(all.toLowerCase()).not.toContain('set-cookie');
  });
});
