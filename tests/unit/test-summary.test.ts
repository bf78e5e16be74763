import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/** Runs scripts/test-summary.mjs on invented reports; answers its closing line and exit status. */
function summary(vitest: object, vitestRc: string) {
  const dir = mkdtempSync(path.join(tmpdir(), 'summary-'));
  const file = (name: string, text: string) => {
    writeFileSync(path.join(dir, name), text);
    return path.join(dir, name);
  };
  const args = [
    'scripts/test-summary.mjs',
    file('vitest.json', JSON.stringify(vitest)),
    file('playwright.json', JSON.stringify({ stats: { expected: 2 } })),
    file('checks.txt', 'type check: passed\n'),
    file('vitest.rc', `${vitestRc}\n`),
  ];
  try {
    return { line: execFileSync('node', args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).trim(), status: 0 };
  } catch (e) {
    const err = e as { stdout: string; status: number };
    return { line: err.stdout.trim(), status: err.status };
  }
}

describe('the closing line of npm test', () => {
  it('counts a vitest run that failed with no failed test (an error a test left behind) as one failure', () => {
    expect(summary({ numPassedTests: 3, numFailedTests: 0, testResults: [] }, '1')).toEqual({ line: '6 passed, 1 failed', status: 1 });
  });

  it('adds nothing when the failed tests already say why, or when vitest passed', () => {
    const failedOne = { numPassedTests: 2, numFailedTests: 1, testResults: [{ status: 'failed', assertionResults: [{ status: 'failed' }] }] };
    expect(summary(failedOne, '1')).toEqual({ line: '5 passed, 1 failed', status: 1 });
    expect(summary({ numPassedTests: 3, numFailedTests: 0, testResults: [] }, '0')).toEqual({ line: '6 passed, 0 failed', status: 0 });
  });
});
