import { HANDOUT_CAUTIONS, type ExportDocument } from './exports.schemas';
import { rateText } from './number-format';

/**
 * RFC 4180: quote a field holding a comma, quote, line break or edge spaces; double inner quotes.
 * A `#` (unlabelled steps are `#3`) is quoted too, so readers that skip the `#` caution lines
 * never take it for the start of a comment.
 */
export function csvField(value: string | number | boolean | null): string {
  const text = value === null ? '' : String(value);
  return /[",\r\n#]|^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const csvLine = (fields: Array<string | number | boolean | null>) => fields.map(csvField).join(',');

/**
 * One row per step of every mechanism. Numbers stay plain (ΔH in kJ/mol, threshold in nm) so a
 * spreadsheet reads them as numbers; without the answer key the answer columns are left out.
 * The cautions come first as `#` comment lines (the convention csv-parse, pandas and R read with
 * their comment option), so a spreadsheet shows them above the table and no data row carries them.
 */
export function renderCsv(doc: ExportDocument): string {
  const header = ['mechanism', 'revision', 'step', 'equation', 'rate'];
  if (doc.answerKey) header.push('class', 'balanced', 'dH_kJ_per_mol', 'threshold_nm');
  const lines = [...HANDOUT_CAUTIONS.map((caution) => `# Caution: ${caution}`), csvLine(header)];
  for (const mechanism of doc.mechanisms) {
    mechanism.steps.forEach((step, index) => {
      const row: Array<string | number | boolean | null> = [mechanism.slug, mechanism.revision, step.id, step.equation, rateText(step)];
      const answer = mechanism.answers?.steps[index];
      if (doc.answerKey && answer) row.push(answer.class, answer.balanced, answer.dH, answer.thresholdNm);
      lines.push(csvLine(row));
    });
  }
  return `${lines.join('\r\n')}\r\n`;
}
