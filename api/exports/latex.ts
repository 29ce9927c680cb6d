import type { ExportDocument, MechanismExport } from './exports.schemas';
import { equationCe, netCe, speciesCe } from './mhchem';
import { rateText } from './number-format';

const SPECIALS: Record<string, string> = {
  '\\': '\\textbackslash{}', '&': '\\&', '%': '\\%', $: '\\$', '#': '\\#', _: '\\_', '{': '\\{', '}': '\\}',
  '~': '\\textasciitilde{}', '^': '\\textasciicircum{}',
};

/** Plain text made safe for LaTeX (titles, notes, rate expressions). */
export function texText(text: string): string {
  return text.replace(/[\\&%$#_{}~^]/g, (ch) => SPECIALS[ch]);
}

const num = (value: number | null, digits: number) => (value === null ? '--' : `$${value.toFixed(digits)}$`);
const ceList = (keys: string[]) => (keys.length === 0 ? 'none' : keys.map((key) => `\\ce{${speciesCe(key)}}`).join(', '));

function stepsTable(mechanism: MechanismExport): string[] {
  const answers = mechanism.answers;
  const columns = answers ? 'l l l l l r r' : 'l l l';
  const head = answers ? 'Step & Equation & Rate constant & Class & Balanced & $\\Delta H$ / kJ\\,mol$^{-1}$ & $\\lambda$ / nm' : 'Step & Equation & Rate constant';
  const lines = [`\\begin{longtable}{${columns}}`, `${head} \\\\ \\hline`];
  mechanism.steps.forEach((step, index) => {
    const cells = [texText(step.id), `\\ce{${equationCe(step)}}`, `\\texttt{${texText(rateText(step))}}`];
    const answer = answers?.steps[index];
    if (answer) cells.push(answer.class, answer.balanced ? 'yes' : 'no', num(answer.dH, 1), num(answer.thresholdNm, 0));
    lines.push(`${cells.join(' & ')} \\\\`);
  });
  lines.push('\\end{longtable}');
  return lines;
}

function answerSection(answers: NonNullable<MechanismExport['answers']>): string[] {
  const lines = ['\\subsection*{Answer key}', '\\begin{longtable}{l l l r}', 'Route & Stoichiometric numbers & Net reaction & $\\Delta H$ / kJ\\,mol$^{-1}$ \\\\ \\hline'];
  answers.routes.forEach((route, index) => {
    const sigmas = Object.entries(route.multipliers).map(([id, sigma]) => `${texText(id)}\\,$\\times${sigma}$`).join(', ');
    const net = route.kind === 'null-cycle' ? 'null cycle' : `\\ce{${netCe(route.netSpecies)}}`;
    lines.push(`${index + 1}${answers.overall === index ? ' (overall)' : ''} & ${sigmas} & ${net} & ${num(route.dH, 1)} \\\\`);
  });
  lines.push('\\end{longtable}', '\\begin{itemize}');
  lines.push(`\\item Reactants: ${ceList(answers.reactants)}`, `\\item Products: ${ceList(answers.products)}`);
  lines.push(`\\item Catalysts: ${ceList(answers.catalysts)}`, `\\item Intermediates: ${ceList(answers.intermediates)}`, '\\end{itemize}');
  return lines;
}

function mechanismSection(mechanism: MechanismExport): string[] {
  const lines = [`\\section{${texText(mechanism.title)}}`, `Revision r${mechanism.revision} of \\texttt{${texText(mechanism.slug)}}.`, ''];
  if (mechanism.note) lines.push(`\\begin{quote}${texText(mechanism.note)}\\end{quote}`);
  lines.push('\\subsection*{Steps}', ...stepsTable(mechanism));
  if (mechanism.answers) lines.push(...answerSection(mechanism.answers));
  return lines;
}

/** A LaTeX document (mhchem for every equation, longtable for steps and routes). */
export function renderLatex(doc: ExportDocument): string {
  const title = doc.set?.title ?? doc.mechanisms[0].title;
  const lines = [
    '\\documentclass[a4paper]{article}', '\\usepackage[T1]{fontenc}', '\\usepackage[utf8]{inputenc}',
    '\\usepackage[version=4]{mhchem}', '\\usepackage{longtable}',
    `\\title{${texText(title)}${doc.answerKey ? ' --- answer key' : ''}}`, '\\date{}', '\\begin{document}', '\\maketitle',
  ];
  if (doc.set?.audience) lines.push(`Audience: ${texText(doc.set.audience)}`, '');
  for (const mechanism of doc.mechanisms) lines.push(...mechanismSection(mechanism));
  lines.push('\\end{document}');
  return `${lines.join('\n')}\n`;
}
