import { describe, expect, it } from 'vitest';
import { render } from '@testing-library/react';
import { SlotShares } from '@/features/clients/components/slot-shares';

// The demo client's numbers (invented demo data): 2165 kcal a day, two plates of 455 kcal each.
const day = { targetKcal: 2165, netCarbCapG: 35, proteinG: 114 };
const plate = { targetKcal: 455, netCarbCapG: 7.4, proteinG: 23.9 };

describe('a client’s day split over their plates', () => {
  it('gives each plate its share of the day, and what is left for the client’s own meals', () => {
    const { container } = render(<SlotShares day={day} slots={{ breakfast: plate, lunch: plate }} />);
    const text = (container.textContent ?? '').replace(/\s+/g, ' ');
    // 455 / 2165 = 21.0 %; the rest: 2165 − 910 = 1255 kcal, 35 − 14.8 = 20.2 g, 114 − 47.8 = 66.2 g (by hand).
    expect(text).toContain('breakfast (21 %): 455 kcal · ≤ 7.4 g net carbs · 23.9 g protein');
    expect(text).toContain('Your own meals, the rest of the day (58 %): about 1255 kcal · ≤ 20.2 g net carbs · 66.2 g protein');
  });

  it('says nothing of other meals when the plates cover the whole day', () => {
    const third = { targetKcal: 2165 / 3, netCarbCapG: 35 / 3, proteinG: 38 };
    const { container } = render(<SlotShares day={day} slots={{ breakfast: third, lunch: third, dinner: third }} />);
    expect(container.textContent).not.toContain('Your own meals');
  });
});
