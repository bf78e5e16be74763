// Sums the vitest and Playwright JSON reports into one closing line: "N passed, N failed[, N skipped]".
import fs from 'node:fs';

let passed = 0;
let failed = 0;
let skipped = 0;
const [vitestFile, playwrightFile] = process.argv.slice(2);

function read(file) {
  try {
    return JSON.parse(fs.readFileSync(file, 'utf8'));
  } catch {
    return null;
  }
}

const v = read(vitestFile);
if (v) {
  passed += v.numPassedTests ?? 0;
  // A file that failed to load has no failed test in it: count it as one failure.
  const brokenFiles = (v.testResults ?? []).filter(
    (r) => r.status === 'failed' && !(r.assertionResults ?? []).some((a) => a.status === 'failed'),
  ).length;
  failed += (v.numFailedTests ?? 0) + brokenFiles;
  skipped += (v.numPendingTests ?? 0) + (v.numTodoTests ?? 0);
} else {
  failed += 1;
  console.error('vitest report missing: counted as one failure');
}

const p = read(playwrightFile);
if (p) {
  const s = p.stats ?? {};
  passed += (s.expected ?? 0) + (s.flaky ?? 0);
  failed += s.unexpected ?? 0;
  skipped += s.skipped ?? 0;
  if ((p.errors ?? []).length) failed += p.errors.length;
} else {
  failed += 1;
  console.error('Playwright report missing: counted as one failure');
}

console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exitCode = failed > 0 ? 1 : 0;
