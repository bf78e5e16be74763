// Sums the vitest and Playwright JSON reports and the other checks (lines "name: passed|failed", e.g. the type
// check) into one closing line: "N passed, N failed[, N skipped]".
import fs from 'node:fs';

let passed = 0;
let failed = 0;
let skipped = 0;
const [vitestFile, playwrightFile, checksFile, vitestRcFile] = process.argv.slice(2);

function readText(file) {
  try {
    return fs.readFileSync(file, 'utf8');
  } catch {
    return null;
  }
}

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
  // Vitest failed the run with no failed test in its report: an error outside any test (an unhandled error or
  // rejection a test left behind). Counted as one failure, so the closing line agrees with the exit status.
  const rc = vitestRcFile ? Number(readText(vitestRcFile)?.trim() ?? '0') : 0;
  if (rc !== 0 && (v.numFailedTests ?? 0) + brokenFiles === 0) {
    failed += 1;
    console.error(`vitest exited with ${rc} and no failed test: an error outside the tests (see "Errors" above), counted as one failure`);
  }
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

if (checksFile) {
  let text = null;
  try {
    text = fs.readFileSync(checksFile, 'utf8');
  } catch {
    failed += 1;
    console.error('checks report missing: counted as one failure');
  }
  for (const line of (text ?? '').split('\n').filter(Boolean)) {
    if (/: passed$/.test(line)) passed += 1;
    else {
      failed += 1;
      console.error(line);
    }
  }
}

console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exitCode = failed > 0 ? 1 : 0;
