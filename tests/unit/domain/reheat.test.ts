import { describe, expect, it } from 'vitest';
import { reheatGroups, reheatGroupTitle } from '@shared/domain/reheat';

// Invented plates and trays (the grouping is our own rule; no outside source decides it).
const tray = (name: string, reheatSteps: string[]) => ({ name, reheatSteps });

describe('reheating a plate, in groups', () => {
  it("keeps the trays' steps when the plate has its own, which come last as the whole plate's", () => {
    const groups = reheatGroups({ reheatSteps: ['Crisp the wrap in a dry pan, 30 s a side'], trays: [tray('Egg slab', ['Microwave covered until 165 °F'])] });
    expect(groups).toEqual([
      { trays: ['Egg slab'], steps: ['Microwave covered until 165 °F'] },
      { trays: [], steps: ['Crisp the wrap in a dry pan, 30 s a side'] },
    ]);
    expect(groups.map((g) => reheatGroupTitle(g, groups.length))).toEqual(['Egg slab', 'The whole plate']);
    const own = reheatGroups({ reheatSteps: ['Oven 350 °F, 8 minutes, covered'], trays: [tray('Ham', [])] });
    expect(own).toEqual([{ trays: [], steps: ['Oven 350 °F, 8 minutes, covered'] }]);
    expect(reheatGroupTitle(own[0], own.length)).toBeNull();
  });

  it("gives each tray's steps under its name, trays with the same steps together, trays without steps left out", () => {
    const groups = reheatGroups({
      reheatSteps: [],
      trays: [tray('Oven bacon', ['Dry pan 30 s']), tray('Radish tray', ['Oven 350 °F, 8 minutes']), tray('Ham', []), tray('Bacon bits', ['Dry pan 30 s']), tray('Oven bacon', ['Dry pan 30 s'])],
    });
    expect(groups).toEqual([
      { trays: ['Oven bacon', 'Bacon bits'], steps: ['Dry pan 30 s'] },
      { trays: ['Radish tray'], steps: ['Oven 350 °F, 8 minutes'] },
    ]);
    expect(groups.map((g) => reheatGroupTitle(g, groups.length))).toEqual(['Oven bacon and Bacon bits', 'Radish tray']);
  });

  it('needs no heading for a single tray, and has no group at all when nothing says how', () => {
    const one = reheatGroups({ reheatSteps: [], trays: [tray('Egg slab', ['Microwave 60 s'])] });
    expect(reheatGroupTitle(one[0], one.length)).toBeNull();
    expect(reheatGroups({ reheatSteps: [], trays: [tray('Ham', [])] })).toEqual([]);
  });
});
