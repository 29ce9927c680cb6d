import { analyseMechanism } from '@api/chemistry/analyse';
import { exportDocument, type ExportItem } from '@api/exports/export-document';
import type { ExportDocument } from '@api/exports/exports.schemas';
import { exampleFiles } from '../helpers/examples';

/** A mechanism written for these tests: a fall-off rate (commas) and a reversible step (a pipe). */
export const FALLOFF_SOURCE = [
  '%title Nitrogen dioxide association',
  'N1: OH• + NO2 + M -> HNO3 + M   @ falloff(1.8e-30 * (T / 300)^-3.0, 2.8e-11, 0.6)',
  'N2: NO2 + hν -> NO• + O(3P)      @ 8.0e-3',
  'N3: O(3P) + O2 + M -> O3 + M     @ 6.0e-34 * (T / 300)^-2.4',
  'N4: NO• + O3 <=> NO2 + O2        @ 3.0e-12 * exp(-1500 / T) | 1.0e-30',
  '',
].join('\n');

/** Every well-formed example plus the test mechanism, analysed by the engine as a revision would be. */
export function exportItems(): ExportItem[] {
  const examples = exampleFiles().filter((file) => file.name !== 'faulty.steps');
  const sources = [...examples.map((file) => ({ slug: file.name.replace(/\.steps$/, ''), text: file.text })), { slug: 'no2-association', text: FALLOFF_SOURCE }];
  return sources.map(({ slug, text }, index) => {
    const analysis = analyseMechanism(text);
    return { title: analysis.title ?? slug, slug, revision: index + 1, note: `Note for ${slug}: 50% & "quoted", #1`, source: text, analysis };
  });
}

/** The export document as the API builds it, with or without the answer key. */
export function exportDoc(answers: boolean): ExportDocument {
  return exportDocument(exportItems(), { answers, set: { title: 'Radical cycles, week 3', audience: 'Short professional course' }, now: new Date('2026-03-01T09:00:00Z') });
}
