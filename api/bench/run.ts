import type { BenchRow, BenchSuite } from './types';

/**
 * `npm run bench [group…]`: runs every suite (or the named groups) and prints each figure side by side
 * with its baseline. Suites are loaded lazily so that one missing suite does not stop the others.
 */
const suites: Record<string, () => Promise<{ default: BenchSuite }>> = {
  engine: () => import('./engine'),
  exports: () => import('./exports'),
  kinetics: () => import('./kinetics'),
  network: () => import('./web-network'),
  repository: () => import('./repository'),
  web: () => import('./web'),
};

function format(row: BenchRow): string {
  const value = `${row.value.toPrecision(4)} ${row.unit}`;
  const base = row.baseline ? `${row.baseline.name}: ${row.baseline.value.toPrecision(4)} ${row.baseline.unit}` : '';
  return [row.group.padEnd(9), row.name.padEnd(48), value.padEnd(22), base.padEnd(44), row.target ?? ''].join(' ');
}

async function main(): Promise<void> {
  const wanted = process.argv.slice(2);
  const names = wanted.length > 0 ? wanted : Object.keys(suites);
  console.log(['group'.padEnd(9), 'figure'.padEnd(48), 'value'.padEnd(22), 'baseline'.padEnd(44), 'target'].join(' '));
  for (const name of names) {
    const load = suites[name];
    if (!load) throw new Error(`unknown bench group "${name}"; known: ${Object.keys(suites).join(', ')}`);
    const suite = (await load()).default;
    for (const row of await suite()) console.log(format(row));
  }
}

await main();
