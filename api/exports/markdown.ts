import { HANDOUT_CAUTIONS, type ExportDocument, type MechanismExport } from './exports.schemas';
import { formatKj, formatNm, multipliersText, rateText, yesNo } from './number-format';

// Inside a table cell a pipe ends the cell and a backtick ends code: escape or replace both.
const cell = (text: string) => text.replace(/\|/g, '\\|').replace(/\n/g, ' ');
const code = (text: string) => (text === '' ? '' : `\`${text.replace(/`/g, "'")}\``);
const row = (cells: string[]) => `| ${cells.map(cell).join(' | ')} |`;
const list = (keys: string[]) => (keys.length === 0 ? 'none' : keys.map(code).join(', '));

function stepsTable(mechanism: MechanismExport): string[] {
  const answers = mechanism.answers;
  const head = answers ? ['Step', 'Equation', 'Rate constant', 'Class', 'Balanced', 'ΔH / kJ mol⁻¹', 'Threshold / nm'] : ['Step', 'Equation', 'Rate constant'];
  const lines = [row(head), row(head.map(() => '---'))];
  mechanism.steps.forEach((step, index) => {
    const cells = [step.id, code(step.equation), code(rateText(step))];
    const answer = answers?.steps[index];
    if (answer) cells.push(answer.class, yesNo(answer.balanced), formatKj(answer.dH), formatNm(answer.thresholdNm));
    lines.push(row(cells));
  });
  return lines;
}

function answerSection(answers: NonNullable<MechanismExport['answers']>): string[] {
  const lines = ['', '### Answer key', '', row(['Route', 'Stoichiometric numbers', 'Net reaction', 'ΔH / kJ mol⁻¹']), row(['---', '---', '---', '---'])];
  answers.routes.forEach((route, index) => {
    const name = `${index + 1}${answers.overall === index ? ' (overall)' : ''}${route.kind === 'null-cycle' ? ' (null cycle)' : ''}`;
    lines.push(row([name, multipliersText(route.multipliers), code(route.net), formatKj(route.dH)]));
  });
  lines.push('', `- Reactants: ${list(answers.reactants)}`, `- Products: ${list(answers.products)}`);
  lines.push(`- Catalysts: ${list(answers.catalysts)}`, `- Intermediates: ${list(answers.intermediates)}`);
  return lines;
}

function mechanismSection(mechanism: MechanismExport, index: number): string[] {
  const lines = [`## ${index + 1}. ${mechanism.title}`, '', `Revision r${mechanism.revision} of \`${mechanism.slug}\`.`];
  if (mechanism.note) lines.push('', ...mechanism.note.split('\n').map((line) => `> ${line}`));
  lines.push('', '### Steps', '', ...stepsTable(mechanism));
  if (mechanism.answers) lines.push(...answerSection(mechanism.answers));
  return lines;
}

/** A Markdown handout: one section per mechanism, the answer key only when asked for. */
export function renderMarkdown(doc: ExportDocument): string {
  const title = doc.set?.title ?? doc.mechanisms[0].title;
  const lines = [`# ${title}${doc.answerKey ? ' — answer key' : ''}`];
  if (doc.set?.audience) lines.push('', `Audience: ${doc.set.audience}`);
  lines.push('', '> **Cautions**', '>', ...HANDOUT_CAUTIONS.map((caution) => `> - ${caution}`));
  doc.mechanisms.forEach((mechanism, index) => lines.push('', ...mechanismSection(mechanism, index)));
  return `${lines.join('\n')}\n`;
}
