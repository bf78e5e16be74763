import type { EntityManager } from '@mikro-orm/postgresql';
import { shortDate, type IsoDate } from '@shared/domain/iso-date.js';
import type { WeekBakeRunDto } from '@shared/schemas/bake-setup.schema.js';
import { clockOf, datesOf, scaleOf, type Actor } from '../../http/authz.js';
import { Conflict } from '../../http/errors.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { renderBakeRunPdf } from '../pdf/bake-run.pdf.js';
import { getWeekBakeRun } from './bake-run.service.js';
import { listCooling } from './cooling.service.js';

/** A prep date's planned bake run; a 409 saying why when there is nothing to plan yet (no trays, no ovens). */
export async function plannedBakeRun(em: EntityManager, actor: Actor, weekId: number, prepDate?: string) {
  const dto = await getWeekBakeRun(em, actor, weekId, prepDate);
  if (!dto.run) throw new Conflict(`Nothing to plan yet: ${dto.problems.join(' ')}`, { problems: dto.problems });
  return { dto: dto as WeekBakeRunDto & { prepDate: IsoDate }, run: dto.run };
}

/** The bake run of a prep date as a PDF (the download, and the prep-day e-mail's attachment), with its cooling record so far. */
export async function bakeRunPdf(em: EntityManager, actor: Actor, weekId: number, prepDate?: string) {
  const { dto, run } = await plannedBakeRun(em, actor, weekId, prepDate);
  const ws = await em.findOneOrFail(Workspace, { id: actor.workspaceId }, { fields: ['name'] });
  const cooling = await listCooling(em, actor, weekId, dto.prepDate);
  return renderBakeRunPdf(run, {
    businessName: ws.name,
    title: `Bake run, ${dto.weekName}, prep ${shortDate(dto.prepDate, datesOf(actor))}`,
    filename: `bake-run-${dto.prepDate}.pdf`,
    dateOrder: datesOf(actor),
    clock: clockOf(actor),
    replanned: dto.settings.done && { from: dto.settings.done.from, kept: dto.settings.done.out.length },
    cooling: cooling.records,
    timeZone: cooling.timeZone,
    tempScale: scaleOf(actor),
  });
}
