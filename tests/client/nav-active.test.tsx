import { describe, expect, it } from 'vitest';
import { NAV, navItemActive } from '@/app/nav';

// Which side-rail item a page belongs to (the rail marks it with aria-current="page"). Paths as src/config/paths.ts
// builds them; the week id is any number.
const activeOn = (pathname: string) => NAV.filter((i) => i.roles.includes('coach') && navItemActive(i, pathname)).map((i) => i.label);

describe('the side rail marks the page’s own item', () => {
  it.each([
    ['/', ['This week']],
    ['/weeks', ['Week board']],
    ['/weeks/12', ['Week board']],
    ['/weeks/12/bake-run', ['Bake run']],
    ['/bake-run', ['Bake run']],
    ['/weeks/12/shopping', ['Shopping list']],
    ['/shopping', ['Shopping list']],
    ['/weeks/12/labels', ['Labels']],
    ['/trays/4', ['Base trays']],
    ['/bake-rules', ['Bake rules & ovens']],
    ['/ingredients/new', ['Ingredients']],
  ])('%s → %j', (pathname, labels) => {
    expect(activeOn(pathname)).toEqual(labels);
  });
});
