import type { CutPlanInput, PanDto } from '@shared/schemas/trays.schema';

const SCALE = 10; // viewBox units per inch or cm
const RIM = 6;

/** Where the cuts go: a rows × columns grid, or N pieces laid out as a near-square grid in the pan's shape. */
function layout(plan: CutPlanInput, long: number, short: number): { rows: number; columns: number; count: number } {
  if (plan.kind === 'grid') return { rows: plan.rows, columns: plan.columns, count: plan.rows * plan.columns };
  const columns = Math.max(1, Math.round(Math.sqrt((plan.pieces * long) / short)));
  return { rows: Math.ceil(plan.pieces / columns), columns, count: plan.pieces };
}

/** Words for the drawing, e.g. "Half sheet pan cut 4 × 5 (20 portions)". */
export function panDrawingLabel(pan: PanDto, plan: CutPlanInput): string {
  return plan.kind === 'grid'
    ? `${pan.label} cut ${plan.rows} × ${plan.columns} (${plan.rows * plan.columns} portions)`
    : `${pan.label} in ${plan.pieces} pieces`;
}

/**
 * A small drawing of the pan in its own proportions with its cut plan: grid lines for a grid cut, separate pieces
 * for "N pieces". Used on library cards that have no photo, so the library still reads at a glance.
 */
export function PanDrawing({ pan, cutPlan, className = 'h-[90px] w-auto' }: { pan: PanDto; cutPlan: CutPlanInput; className?: string }) {
  const long = Math.max(pan.length, pan.width);
  const short = Math.min(pan.length, pan.width);
  const w = long * SCALE;
  const h = short * SCALE;
  const { rows, columns, count } = layout(cutPlan, long, short);
  const innerW = w - 2 * RIM;
  const innerH = h - 2 * RIM;
  const cellW = innerW / columns;
  const cellH = innerH / rows;
  const label = panDrawingLabel(pan, cutPlan);

  return (
    <svg viewBox={`-4 -4 ${w + 8} ${h + 8}`} className={className} role="img" aria-label={label}>
      <title>{label}</title>
      <rect x={0} y={0} width={w} height={h} rx={RIM * 1.6} className="fill-line-strong stroke-ink-soft" strokeWidth={2} />
      {cutPlan.kind === 'grid' ? (
        <g>
          <rect x={RIM} y={RIM} width={innerW} height={innerH} rx={3} className="fill-oven-1" />
          {Array.from({ length: columns - 1 }, (_, i) => (
            <line key={`c${i}`} x1={RIM + cellW * (i + 1)} x2={RIM + cellW * (i + 1)} y1={RIM} y2={RIM + innerH} className="stroke-oven-4" strokeWidth={2} />
          ))}
          {Array.from({ length: rows - 1 }, (_, i) => (
            <line key={`r${i}`} y1={RIM + cellH * (i + 1)} y2={RIM + cellH * (i + 1)} x1={RIM} x2={RIM + innerW} className="stroke-oven-4" strokeWidth={2} />
          ))}
        </g>
      ) : (
        <g>
          <rect x={RIM} y={RIM} width={innerW} height={innerH} rx={3} className="fill-paper-card" />
          {Array.from({ length: count }, (_, i) => {
            const r = Math.floor(i / columns);
            const c = i % columns;
            const gap = Math.min(cellW, cellH) * 0.14;
            return (
              <rect
                key={i}
                x={RIM + c * cellW + gap}
                y={RIM + r * cellH + gap}
                width={cellW - 2 * gap}
                height={cellH - 2 * gap}
                rx={Math.min(cellW, cellH) * 0.3}
                className="fill-oven-2 stroke-oven-4"
                strokeWidth={1.5}
              />
            );
          })}
        </g>
      )}
    </svg>
  );
}
