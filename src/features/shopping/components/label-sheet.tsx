import { LABEL_SHEETS, labelPosition, pagesOf, type LabelSheetCode } from '@shared/domain/label-sheets';
import { REHEAT_MIN_F } from '@shared/domain/eat-by';
import { bothScales } from '@shared/domain/temperature';
import { useTempScale } from '@/lib/temp-scale';
import type { ContainerLabelDto } from '@shared/schemas/shopping.schema';
import { allergenLabel } from '@shared/domain/allergens';
import { dayLabel } from '@/lib/dates';

function Label({ label, small }: { label: ContainerLabelDto; small: boolean }) {
  const scale = useTempScale();
  const m = label.macros;
  return (
    <div className={`flex h-full gap-[2%] overflow-hidden p-[4%] leading-tight text-black ${small ? 'text-[6.5pt]' : 'text-[8.5pt]'}`}>
      <div className="flex min-w-0 flex-1 flex-col gap-[1px]">
        <p className={`truncate font-bold ${small ? 'text-[8pt]' : 'text-[11pt]'}`}>{label.title}</p>
        <p className="truncate">
          {label.planned && (
            <b>
              {dayLabel(label.planned.date)} {label.planned.slot} ·{' '}
            </b>
          )}
          {label.portions && <b>{label.portions} portions · </b>}
          {label.subtitle}
        </p>
        <p>
          Made <b>{dayLabel(label.madeOn)}</b> · Eat by <b>{dayLabel(label.eatBy)}</b>
        </p>
        {label.freezeBy && (
          <p>
            Freeze by <b>{dayLabel(label.freezeBy)}</b>
          </p>
        )}
        {label.frozenBestBy && (
          <p>
            Frozen; best quality by <b>{dayLabel(label.frozenBestBy)}</b>
          </p>
        )}
        <p className="truncate">
          Reheat: {label.reheat ?? 'until hot'} — to {bothScales(REHEAT_MIN_F, scale)}
        </p>
        {m ? (
          <p className="num">
            {m.calories} kcal · fat {m.fat} · carb {m.carbohydrate} · protein {m.protein} · net carb {m.netCarbs}
          </p>
        ) : (
          <p>Macros: incomplete (a line cannot be weighed)</p>
        )}
        <p className="truncate font-bold">{label.allergenText}</p>
        {label.onClientList.length > 0 && (
          // A border prints without "background graphics"; the words carry it without colour.
          <p className="truncate border border-black px-[2px] font-bold">⚠ On the client’s allergen list: {label.onClientList.map(allergenLabel).join(', ')}</p>
        )}
      </div>
      <img src={label.qr} alt={`QR code to ${label.url}`} className={`${small ? 'w-[14mm]' : 'w-[0.95in]'} shrink-0 self-center`} />
    </div>
  );
}

/**
 * The sheet at real size: one page per sheet, labels placed by the sheet's geometry. Print at 100 % (actual size).
 * `skip` places of the first sheet are left blank (a sheet used in part before); the screen marks them as used.
 */
export function LabelSheet({ layout, labels, skip = 0 }: { layout: LabelSheetCode; labels: ContainerLabelDto[]; skip?: number }) {
  const sheet = LABEL_SHEETS[layout];
  const u = sheet.unit;
  const pages = pagesOf(labels, sheet, skip);
  return (
    <>
      <style>{`@page { size: ${sheet.page.cssSize}; margin: 0; } @media print { #main { padding: 0 !important; margin: 0 !important; max-width: none !important; } .label-page { box-shadow: none !important; margin: 0 !important; break-after: page; } .label-page:last-child { break-after: auto; } }`}</style>
      {/* A Letter sheet (816 px) is wider than the content column below xl (the side rail takes 15rem). */}
      <p className="no-print text-sm text-ink-faint xl:hidden">The sheets are at real size: scroll sideways to see a whole sheet.</p>
      {/* Sheets centre with auto margins, so a sheet wider than a phone still scrolls to its left edge. */}
      <div role="region" aria-label="Label sheets at real size" tabIndex={0} className="flex flex-col items-start gap-6 overflow-x-auto pb-2 print:block print:gap-0 print:pb-0">
        {pages.map((page, p) => (
          <div
            key={p}
            className="label-page relative mx-auto shrink-0 bg-white shadow-tray"
            style={{ width: `${sheet.page.width}${u}`, height: `${sheet.page.height}${u}` }}
            aria-label={`Sheet ${p + 1} of ${pages.length}`}
          >
            {page.map((label, i) => {
              const pos = labelPosition(sheet, i);
              return (
                <div
                  key={i}
                  className="absolute rounded-[2mm] outline outline-1 outline-dashed outline-line print:outline-0"
                  style={{
                    left: `${pos.x.toNumber()}${u}`,
                    top: `${pos.y.toNumber()}${u}`,
                    width: `${sheet.label.width}${u}`,
                    height: `${sheet.label.height}${u}`,
                  }}
                >
                  {label === null ? (
                    <p className="no-print flex h-full items-center justify-center bg-paper-deep/60 text-sm text-ink-faint">Already used</p>
                  ) : (
                    <Label label={label} small={layout === 'a4-3x7'} />
                  )}
                  {label !== null && label.shortTrays.length > 0 && (
                    // On screen only: the prep day is short of a tray this plate uses.
                    <p className="no-print absolute -top-2.5 right-2 max-w-[90%] truncate rounded border border-caution bg-caution-50 px-1.5 text-xs font-bold text-ink">
                      ⚠ Short: {label.shortTrays.join(', ')}
                    </p>
                  )}
                </div>
              );
            })}
          </div>
        ))}
      </div>
    </>
  );
}
