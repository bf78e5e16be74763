import { Link } from 'react-router-dom';
import { allergenLabel } from '@shared/domain/allergens';
import type { TraySummaryDto } from '@shared/schemas/trays.schema';
import { paths } from '@/config/paths';
import { PanDrawing } from './pan-drawing';

/** A library card: photo (or a drawing of the pan and its cut plan), name, per-portion macros, tags and allergens. */
export function TrayCard({ tray }: { tray: TraySummaryDto }) {
  const p = tray.perPortion;
  return (
    <li className="flex flex-col overflow-hidden rounded-tray bg-paper-card shadow-tray">
      {tray.photo ? (
        <img src={tray.photo.thumbnailUrl} alt="" width={480} height={360} className="aspect-[4/3] w-full object-cover" loading="lazy" />
      ) : (
        <div className="flex h-[118px] w-full items-center justify-center border-b border-line bg-paper-deep px-4">
          <PanDrawing pan={tray.pan} cutPlan={tray.cutPlan} />
        </div>
      )}
      <div className="flex flex-1 flex-col gap-2 p-4">
        <h2 className="text-lg leading-tight">
          <Link to={paths.tray(tray.id)} className="underline-offset-2 hover:underline">
            {tray.name}
          </Link>
        </h2>
        <p className="text-sm text-ink-faint">
          {tray.portions} portions · <span className="whitespace-nowrap">{tray.pan.label}</span>
          {tray.archived && <span className="ml-2 rounded bg-paper-deep px-1 font-bold text-ink-soft">Archived</span>}
          {tray.isDemo && <span className="ml-2 rounded bg-paper-deep px-1 text-ink-soft">demo</span>}
        </p>
        {p ? (
          <dl className="num grid grid-cols-4 gap-1 text-center text-sm">
            {[
              ['kcal', p.kcal.toFixed(0)],
              ['fat', `${p.fatG.toFixed(1)} g`],
              ['protein', `${p.proteinG.toFixed(1)} g`],
              ['net carbs', `${p.netCarbsG.toFixed(1)} g`],
            ].map(([k, v]) => (
              <div key={k} className="rounded bg-paper-deep px-1 py-1">
                <dt className="text-[0.7rem] uppercase text-ink-faint">{k}</dt>
                <dd className="font-bold">{v}</dd>
              </div>
            ))}
          </dl>
        ) : (
          <p className="text-sm text-caution-700">⚠ A line cannot be weighed: open the tray to fix it.</p>
        )}
        {tray.allergens.length > 0 && (
          <p className="text-sm">
            <span className="font-bold">Contains:</span> {tray.allergens.map(allergenLabel).join(', ')}
          </p>
        )}
        {tray.tags.length > 0 && (
          <ul className="mt-auto flex flex-wrap gap-1" aria-label="Tags">
            {tray.tags.map((t) => (
              <li key={t} className="rounded-full border border-line-strong px-2 text-xs">
                {t}
              </li>
            ))}
          </ul>
        )}
      </div>
    </li>
  );
}
