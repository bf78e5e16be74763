import { andList } from './words';

/**
 * How a plate is reheated, in groups a person follows one at a time (the client's page and their plan PDF).
 *
 * Each tray's steps are a group of their own, named by the tray (trays with the very same steps share a group), and
 * the plate's own steps, when the coach wrote some, come last as "The whole plate". Read one after the other as a
 * single numbered list, "reheat in a pan" then "reheat in the oven" looked like two reheats of the same food. Nothing
 * is dropped: a plate's finishing step ("crisp the wrap in a pan") must not hide its trays' steps to 165 °F.
 */
export interface ReheatGroup {
  /** The trays these steps are for; empty for the plate's own steps. */
  trays: string[];
  steps: string[];
}

export interface ReheatSource {
  reheatSteps: readonly string[];
  trays: readonly { name: string; reheatSteps: readonly string[] }[];
}

export function reheatGroups(plate: ReheatSource): ReheatGroup[] {
  const groups: ReheatGroup[] = [];
  const byKey = new Map<string, ReheatGroup>();
  for (const t of plate.trays) {
    if (!t.reheatSteps.length) continue;
    const key = JSON.stringify(t.reheatSteps);
    const same = byKey.get(key);
    if (same) {
      if (!same.trays.includes(t.name)) same.trays.push(t.name);
      continue;
    }
    const group = { trays: [t.name], steps: [...t.reheatSteps] };
    byKey.set(key, group);
    groups.push(group);
  }
  if (plate.reheatSteps.length) groups.push({ trays: [], steps: [...plate.reheatSteps] });
  return groups;
}

/** A group's heading when the plate has more than one ("Oven bacon", "Ham and Salami", "The whole plate"); else null. */
export function reheatGroupTitle(group: ReheatGroup, groupCount: number): string | null {
  if (groupCount < 2) return null;
  return group.trays.length ? andList(group.trays) : 'The whole plate';
}
