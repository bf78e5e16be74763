import { afterAll, beforeAll } from 'vitest';
import { truncateAll } from './db.js';
import { closeTestApp } from './test-app.js';

// Tables are truncated before each API test file; files run one after another.
beforeAll(async () => {
  await truncateAll();
});

afterAll(async () => {
  await closeTestApp();
});
