type Macros = { targetKcal: number; netCarbCapG: number; proteinG: number };
const pct = (part: number, whole: number) => (whole > 0 ? Math.round((part / whole) * 100) : 0);
const tenth = (n: number) => Math.max(0, Math.round(n * 10) / 10);

/**
 * The day's targets split over the plates the coach plans (each slot's share of the day), and what is left for the
 * client's own meals when the plates cover less than the whole day.
 */
export function SlotShares({ day, slots }: { day: Macros; slots: Record<string, Macros> }) {
  const entries = Object.entries(slots);
  const planned = entries.reduce((a, [, s]) => ({ kcal: a.kcal + s.targetKcal, carbs: a.carbs + s.netCarbCapG, protein: a.protein + s.proteinG }), { kcal: 0, carbs: 0, protein: 0 });
  const restKcal = Math.round(day.targetKcal - planned.kcal);
  return (
    <>
      <p className="mt-3 text-sm text-ink-soft">For the whole day. Each plate from your coach aims at its share of it:</p>
      <ul className="mt-1 flex flex-col gap-1 text-sm">
        {entries.map(([slot, s]) => (
          <li key={slot} className="num">
            <span className="capitalize">{slot}</span> ({pct(s.targetKcal, day.targetKcal)} %): {s.targetKcal} kcal · ≤ {s.netCarbCapG} g net carbs · {s.proteinG} g protein
          </li>
        ))}
        {restKcal > 1 && (
          <li className="num">
            Your own meals, the rest of the day ({100 - pct(planned.kcal, day.targetKcal)} %): about {restKcal} kcal · ≤ {tenth(day.netCarbCapG - planned.carbs)} g net
            carbs · {tenth(day.proteinG - planned.protein)} g protein
          </li>
        )}
      </ul>
    </>
  );
}
