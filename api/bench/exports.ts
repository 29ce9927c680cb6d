import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { analyseMechanism } from '@api/chemistry/analyse';
import { exportDocument } from '@api/exports/export-document';
import type { ExportFormat } from '@api/exports/exports.schemas';
import { renderExport } from '@api/exports/render';
import type { BenchRow, BenchSuite } from './types';

const examplesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'examples');

/** Every well-formed example as one set, the way an instructor's whole course would be exported. */
function courseDocument(count: number) {
  const files = readdirSync(examplesDir).filter((name) => name.endsWith('.steps') && name !== 'faulty.steps').sort().slice(0, count);
  const items = files.map((file, index) => {
    const source = readFileSync(path.join(examplesDir, file), 'utf8');
    return { title: file, slug: file.replace(/\.steps$/, ''), revision: index + 1, note: '', source, analysis: analyseMechanism(source) };
  });
  return exportDocument(items, { answers: true, set: { title: 'Bench course', audience: '' } });
}

async function meanMs(work: () => Promise<unknown>, runs: number): Promise<number> {
  const start = performance.now();
  for (let i = 0; i < runs; i++) await work();
  return (performance.now() - start) / runs;
}

/** Export rendering: the text formats, and PDF worksheets against the first one (which parses the fonts). */
const exportsBench: BenchSuite = async () => {
  const one = courseDocument(1);
  const all = courseDocument(100);
  const first = await meanMs(() => renderExport(one, 'pdf'), 1);
  await meanMs(() => renderExport(all, 'pdf'), 3);
  const firstRow = { name: 'first PDF worksheet of the process (fonts parsed)', value: first, unit: 'ms' };
  const rows: BenchRow[] = [
    { group: 'exports', name: 'PDF worksheet, 1 mechanism + answers', value: await meanMs(() => renderExport(one, 'pdf'), 10), unit: 'ms', baseline: firstRow, target: '< 500 ms' },
    { group: 'exports', name: `PDF worksheet, ${all.mechanisms.length} mechanisms + answers`, value: await meanMs(() => renderExport(all, 'pdf'), 5), unit: 'ms', baseline: firstRow, target: '< 1 s' },
  ];
  for (const format of ['md', 'tex', 'csv', 'json'] as ExportFormat[]) {
    rows.push({ group: 'exports', name: `${format}, ${all.mechanisms.length} mechanisms + answers`, value: await meanMs(() => renderExport(all, format), 20), unit: 'ms', target: '< 50 ms' });
  }
  return rows;
};

export default exportsBench;
