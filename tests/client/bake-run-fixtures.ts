import { planBakeRun } from '@shared/domain/bake-run';

/** An invented run: two trays at 350 °F in one oven of two racks, from 08:00 (rates are the scheduler's common-practice defaults). */
export const twoTrayRun = planBakeRun({
  start: '2026-12-06T08:00',
  cooks: 1,
  ambientF: 70,
  ovens: [{ name: 'Left oven', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
  trays: [
    { id: 'a', name: 'Spinach egg slab', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
    { id: 'b', name: 'Roasted radish tray', tempF: 350, minMinutes: 20, maxMinutes: 24, handsOnMinutes: 0 },
  ],
});
