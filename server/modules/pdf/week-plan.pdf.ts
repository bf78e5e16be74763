import Decimal from 'decimal.js';
import { CAUTIONS, REHEAT_MIN_F } from '@shared/domain/eat-by.js';
import { bothScales, inReadersScale } from '@shared/domain/temperature.js';
import { reheatGroupTitle } from '@shared/domain/reheat.js';
import type { PdfMacros, PdfTargets, WeekPlanPdfData } from '@shared/schemas/pdf.schema.js';
import { cautionsBlock, createDoc, finishDoc, heading, list, paragraph, table, type Column } from './pdf-document.js';
import { capitalize, fixed, signed } from './pdf-format.js';
import { DEFAULT_DATE_ORDER, longDate, shortDate } from '@shared/domain/iso-date.js';

/** The macro columns in the order every Trayline table shows them (kcal 0 dp, grams 1 dp). */
const MACROS: { key: keyof PdfMacros; target?: keyof PdfTargets; label: string; dp: number; cap?: boolean }[] = [
  { key: 'kcal', target: 'kcal', label: 'kcal', dp: 0 },
  { key: 'fatG', target: 'fatG', label: 'Fat g', dp: 1 },
  { key: 'proteinG', target: 'proteinG', label: 'Protein g', dp: 1 },
  { key: 'netCarbsG', target: 'netCarbsG', label: 'Net carbs g', dp: 1, cap: true },
  { key: 'carbsG', label: 'Carbs g', dp: 1 },
];

const COLUMNS: Column[] = [
  { header: 'Meal', width: 0.13 },
  { header: 'Plate', width: 0.27 },
  { header: 'Portions', width: 0.09, align: 'right' },
  ...MACROS.map((m) => ({ header: m.label, width: 0.102, align: 'right' as const })),
];

function targetLine(t: PdfTargets, cover?: string | null): string {
  const parts: string[] = [];
  if (t.kcal != null) parts.push(`${fixed(t.kcal, 0)} kcal`);
  if (t.fatG != null) parts.push(`fat ${fixed(t.fatG, 1)} g`);
  if (t.proteinG != null) parts.push(`protein ${fixed(t.proteinG, 1)} g`);
  if (t.netCarbsG != null) parts.push(`net carbs at most ${fixed(t.netCarbsG, 1)} g`);
  if (!parts.length) return 'No daily targets set.';
  return cover ? `Targets for ${cover}: ${parts.join(' · ')}` : `Daily targets: ${parts.join(' · ')}`;
}

/** The client's week: per day a macro table (plates, day total, target, difference), then each plate's steps. */
export async function renderWeekPlanPdf(data: WeekPlanPdfData): Promise<{ filename: string; buffer: Buffer }> {
  const order = data.dateOrder ?? DEFAULT_DATE_ORDER;
  const meta = {
    businessName: data.businessName,
    title: `${data.clientName}: week of ${shortDate(data.weekStart, order)}`,
    subject: 'Prep week plan',
  };
  const doc = createDoc(meta);
  heading(doc, `${data.clientName}: your week`, 22);
  paragraph(doc, `Week of ${longDate(data.weekStart, order)}`);
  paragraph(doc, targetLine(data.targets, data.targetsCover));
  if (data.note) {
    doc.moveDown(0.4);
    paragraph(doc, 'A note from your coach', { bold: true });
    paragraph(doc, data.note);
  }
  for (const day of data.days) {
    doc.moveDown(0.8);
    heading(doc, longDate(day.date, order), 16);
    const rows = day.slots.map((s) => [
      capitalize(s.slot),
      s.plateName,
      fixed(s.portions, 2).replace(/\.?0+$/, ''),
      ...MACROS.map((m) => fixed(s.macros[m.key], m.dp)),
    ]);
    rows.push(['Day total', '', '', ...MACROS.map((m) => fixed(day.totals[m.key], m.dp))]);
    rows.push(['Target', '', '', ...MACROS.map((m) => (m.target && data.targets[m.target] != null ? `${m.cap ? '≤ ' : ''}${fixed(data.targets[m.target], m.dp)}` : '–'))]);
    rows.push([
      'Difference',
      '',
      '',
      ...MACROS.map((m) => {
        const t = m.target ? data.targets[m.target] : null;
        if (t == null) return '–';
        const diff = new Decimal(day.totals[m.key]).minus(t);
        if (m.cap) return diff.gt(0) ? `${signed(diff, m.dp)} over` : 'within';
        return signed(diff, m.dp);
      }),
    ]);
    const styles = rows.map((_r, i) => (i >= day.slots.length ? { bold: i === day.slots.length, shade: true } : {}));
    table(doc, COLUMNS, rows, styles);
    for (const s of day.slots) {
      paragraph(doc, `${capitalize(s.slot)}: ${s.plateName}`, { bold: true, size: 11 });
      if (s.eatBy) paragraph(doc, `Eat by ${longDate(s.eatBy, order)}.`);
      for (const n of s.notes ?? []) paragraph(doc, n);
      list(doc, 'Assemble', s.assemblySteps);
      for (const g of s.reheat) {
        const title = reheatGroupTitle(g, s.reheat.length);
        list(doc, title ? `Reheat: ${title}` : 'Reheat', g.steps);
      }
      paragraph(doc, `Heat until every part reaches ${bothScales(REHEAT_MIN_F, data.tempScale)}.`);
      doc.moveDown(0.3);
    }
  }
  cautionsBlock(
    doc,
    (data.cautions ?? CAUTIONS).map((c) => ({ text: inReadersScale(c.text, data.tempScale ?? 'F'), source: c.source })),
  );
  const slug = data.clientName.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'client';
  return { filename: `week-${data.weekStart}-${slug}.pdf`, buffer: await finishDoc(doc, meta) };
}
