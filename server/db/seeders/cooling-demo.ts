import { addLocalMinutes } from '@shared/domain/bake-run-time.js';
import { coolingRecordSchema } from '@shared/schemas/cooling.schema.js';
import type { Actor } from '../../http/authz.js';
import { getWeekBakeRun } from '../../modules/bake-runs/bake-run.service.js';
import { putCooling } from '../../modules/bake-runs/cooling.service.js';
import { Week } from '../../modules/weeks/week.entity.js';
import type { DemoContext } from './demo-seed.js';

/**
 * DEMO DATA — the demo week's first prep day (always past: the Sunday before the week) as the kitchen assistant wrote
 * it down: every tray of its bake run out at its planned time, then two invented readings that meet both stages of
 * FDA Food Code §3-501.14 (135 °F to 70 °F within 2 hours, to 41 °F within 6 hours in total), a little different from
 * tray to tray. Nothing is thrown away and no deadline is missed, so the demo's cooling log reads as a good day.
 */
export async function seedDemoCooling({ em, workspace, assistant }: DemoContext): Promise<void> {
  const actor: Actor = { userId: assistant.id, email: assistant.email, name: assistant.name, role: 'assistant', workspaceId: workspace.id, clientId: null };
  const week = await em.findOneOrFail(Week, { workspace: workspace.id, name: 'Demo week' });
  const { run, prepDate } = await getWeekBakeRun(em, actor, week.id, week.prepDate);
  const trays = [...(run?.trays ?? [])].sort((a, b) => a.outMinute - b.outMinute || a.id.localeCompare(b.id));
  const slab = trays.find((t) => /slab/i.test(t.name));
  for (const [i, t] of trays.entries()) {
    const first = { at: addLocalMinutes(t.outAt, 60 + (i % 4) * 10), tempF: 64 + (i % 5) };
    const last = { at: addLocalMinutes(t.outAt, 225 + (i % 3) * 20), tempF: 37 + (i % 3) };
    const note = t === slab ? 'Cut into portions and spread out on a cold sheet pan to cool faster (demo).' : '';
    await putCooling(em, actor, week.id, t.id, coolingRecordSchema.parse({ prepDate, outAt: t.outAt, readings: [first, last], note }));
  }
}
