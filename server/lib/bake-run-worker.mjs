// Runs in a worker thread (bake-run-pool.ts). A worker does not inherit the parent's TypeScript loader, so this
// entry is plain JavaScript: it registers tsx for this thread, then loads the scheduler from its TypeScript source.
import { register } from 'tsx/esm/api';

register();
const { planBakeRun } = await import('../../shared/domain/bake-run.ts');

/** The scheduler on plain data in and out. */
export default function plan(input) {
  return planBakeRun(input);
}
