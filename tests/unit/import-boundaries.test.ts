import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The import boundaries of the project's guide (DEVELOPERS.md, "Layers"): shared/ is pure (no React, Express,
 * MikroORM, nothing of src/ or server/); src/ and server/ never import each other; a client feature does not import
 * another. Read from the source files themselves, as an import linter would.
 */
const root = path.resolve(__dirname, '../..');

function filesUnder(dir: string): string[] {
  const out: string[] = [];
  for (const entry of fs.readdirSync(path.join(root, dir), { withFileTypes: true })) {
    const rel = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...filesUnder(rel));
    else if (/\.(ts|tsx|mts)$/.test(entry.name)) out.push(rel);
  }
  return out;
}

/** Every module specifier a file imports or re-exports (static and dynamic). */
function importsOf(file: string): string[] {
  const text = fs.readFileSync(path.join(root, file), 'utf8');
  const specs: string[] = [];
  for (const m of text.matchAll(/(?:^|\n)\s*(?:import|export)\s[^'"]*?from\s*['"]([^'"]+)['"]/g)) specs.push(m[1]);
  for (const m of text.matchAll(/(?:^|\n)\s*import\s*['"]([^'"]+)['"]/g)) specs.push(m[1]);
  for (const m of text.matchAll(/\bimport\(\s*['"]([^'"]+)['"]\s*\)/g)) specs.push(m[1]);
  return specs;
}

/** Where a specifier points inside the repository ('src/…', 'server/…', 'shared/…'), or null for a package. */
function target(file: string, spec: string): string | null {
  if (spec.startsWith('@/')) return path.join('src', spec.slice(2));
  if (spec.startsWith('@server/')) return path.join('server', spec.slice(8));
  if (spec.startsWith('@shared/')) return path.join('shared', spec.slice(8));
  if (spec.startsWith('.')) return path.normalize(path.join(path.dirname(file), spec));
  return null;
}

const featureOf = (p: string) => /^src\/features\/([^/]+)\//.exec(p)?.[1] ?? null;

/**
 * Client feature imports that cross features today, each to be folded away (moved to src/lib or
 * src/components/domain, or composed in the route): the list may only shrink.
 */
/** Imports across client features left on purpose, with why (none now: the pages compose features). */
const KNOWN_CROSSINGS = new Set<string>([]);

describe('import boundaries', () => {
  it('shared/ is pure: no React, Express, MikroORM, nor anything of src/ or server/', () => {
    const bad = filesUnder('shared').flatMap((f) =>
      importsOf(f)
        .filter((s) => /^(react|react-dom|express|@mikro-orm\/|pg$)/.test(s) || /^(src|server)\//.test(target(f, s) ?? ''))
        .map((s) => `${f}: ${s}`),
    );
    expect(bad).toEqual([]);
  });

  it('src/ and server/ never import each other', () => {
    const fromSrc = filesUnder('src').flatMap((f) => importsOf(f).filter((s) => (target(f, s) ?? '').startsWith('server/')).map((s) => `${f}: ${s}`));
    const fromServer = filesUnder('server').flatMap((f) => importsOf(f).filter((s) => (target(f, s) ?? '').startsWith('src/')).map((s) => `${f}: ${s}`));
    expect([...fromSrc, ...fromServer]).toEqual([]);
  });

  it('a client feature imports no other feature, beyond the known crossings still to fold away', () => {
    const crossings = new Map<string, string[]>();
    for (const f of filesUnder('src/features')) {
      const from = featureOf(f)!;
      for (const s of importsOf(f)) {
        const to = featureOf(target(f, s) ?? '');
        if (to && to !== from) crossings.set(`${from} -> ${to}`, [...(crossings.get(`${from} -> ${to}`) ?? []), `${f}: ${s}`]);
      }
    }
    const unknown = [...crossings.entries()].filter(([k]) => !KNOWN_CROSSINGS.has(k)).map(([k, v]) => `${k} (${v.join('; ')})`);
    expect(unknown, 'new imports across client features').toEqual([]);
    // A crossing folded away leaves the list too (so it cannot come back unnoticed).
    expect([...KNOWN_CROSSINGS].filter((k) => !crossings.has(k)), 'crossings no longer made: remove them from KNOWN_CROSSINGS').toEqual([]);
  });
});
