import { HANDOUT_CAUTIONS, type ExportDocument, type MechanismExport } from './exports.schemas';
import { equationCe, netCe, speciesCe } from './mhchem';
import { rateText } from './number-format';

const SPECIALS: Record<string, string> = {
  '\\': '\\textbackslash{}', '&': '\\&', '%': '\\%', $: '\\$', '#': '\\#', _: '\\_', '{': '\\{', '}': '\\}',
  '~': '\\textasciitilde{}', '^': '\\textasciicircum{}',
};

// Symbols the trade writes in titles and notes that pdfLaTeX's utf8 input does not know.
const SYMBOLS: Record<string, string> = {
  '•': '\\textbullet{}', '→': '\\ensuremath{\\rightarrow}', '⇌': '\\ensuremath{\\rightleftharpoons}', '−': '\\ensuremath{-}',
  '±': '\\ensuremath{\\pm}', '×': '\\ensuremath{\\times}', '·': '\\ensuremath{\\cdot}', '°': '\\ensuremath{^\\circ}',
  'ν': '\\ensuremath{\\nu}', 'Δ': '\\ensuremath{\\Delta}', 'λ': '\\ensuremath{\\lambda}', 'σ': '\\ensuremath{\\sigma}',
};

const SUPERSCRIPTS = '⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻';
const SUBSCRIPTS = '₀₁₂₃₄₅₆₇₈₉₊₋';
const plainScript = (run: string, from: string) => [...run].map((ch) => '0123456789+-'[from.indexOf(ch)]).join('').replace('-', '$-$');

/** Plain text made safe for pdfLaTeX (titles, notes, rate expressions). */
export function texText(text: string): string {
  return text
    .replace(/[\\&%$#_{}~^]/g, (ch) => SPECIALS[ch])
    .replace(/[•→⇌−±×·°νΔλσ]/gu, (ch) => SYMBOLS[ch])
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻]+/gu, (run) => `\\textsuperscript{${plainScript(run, SUPERSCRIPTS)}}`)
    .replace(/[₀₁₂₃₄₅₆₇₈₉₊₋]+/gu, (run) => `\\textsubscript{${plainScript(run, SUBSCRIPTS)}}`);
}

const num = (value: number | null, digits: number) => (value === null ? '--' : `$${value.toFixed(digits)}$`);
const ceList = (keys: string[]) => (keys.length === 0 ? 'none' : keys.map((key) => `\\ce{${speciesCe(key)}}`).join(', '));

function stepsTable(mechanism: MechanismExport): string[] {
  const answers = mechanism.answers;
  // Paragraph columns wrap long equations and rate expressions inside the text width.
  const columns = answers ? 'l >{\\raggedright}p{4.2cm} >{\\raggedright\\arraybackslash}p{3.2cm} l l r r' : 'l >{\\raggedright}p{7cm} >{\\raggedright\\arraybackslash}p{6cm}';
  const head = answers ? 'Step & Equation & Rate constant & Class & Balanced & $\\Delta H$ & $\\lambda$ / nm' : 'Step & Equation & Rate constant';
  const units = answers ? ['$\\Delta H$ in kJ\\,mol$^{-1}$; $\\lambda$ the photolysis threshold.', ''] : [];
  const lines = [...units, '\\small', `\\begin{longtable}{${columns}}`, `${head} \\\\ \\hline`];
  mechanism.steps.forEach((step, index) => {
    const cells = [texText(step.id), `\\ce{${equationCe(step)}}`, `\\texttt{${texText(rateText(step))}}`];
    const answer = answers?.steps[index];
    if (answer) cells.push(answer.class, answer.balanced ? 'yes' : 'no', num(answer.dH, 1), num(answer.thresholdNm, 0));
    lines.push(`${cells.join(' & ')} \\\\`);
  });
  lines.push('\\end{longtable}', '\\normalsize');
  return lines;
}

function answerSection(answers: NonNullable<MechanismExport['answers']>): string[] {
  const lines = ['\\subsection*{Answer key}', '\\small', '\\begin{longtable}{l >{\\raggedright}p{5.5cm} >{\\raggedright}p{5.5cm} r}',
    'Route & Stoichiometric numbers & Net reaction & $\\Delta H$ / kJ\\,mol$^{-1}$ \\\\ \\hline'];
  answers.routes.forEach((route, index) => {
    const sigmas = Object.entries(route.multipliers).map(([id, sigma]) => `${texText(id)}\\,$\\times${sigma}$`).join(', ');
    const net = route.kind === 'null-cycle' ? 'null cycle' : `\\ce{${netCe(route.netSpecies)}}`;
    lines.push(`${index + 1}${answers.overall === index ? ' (overall)' : ''} & ${sigmas} & ${net} & ${num(route.dH, 1)} \\\\`);
  });
  lines.push('\\end{longtable}', '\\normalsize', '\\begin{itemize}');
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
    '\\usepackage[version=4]{mhchem}', '\\usepackage{longtable}', '\\usepackage{array}', '\\usepackage[margin=2cm]{geometry}',
    `\\title{${texText(title)}${doc.answerKey ? ' --- answer key' : ''}}`, '\\date{}', '\\begin{document}', '\\maketitle',
  ];
  if (doc.set?.audience) lines.push(`Audience: ${texText(doc.set.audience)}`, '');
  lines.push('\\begin{quote}\\small\\textbf{Cautions}', '\\begin{itemize}', ...HANDOUT_CAUTIONS.map((caution) => `\\item ${texText(caution)}`), '\\end{itemize}', '\\end{quote}');
  for (const mechanism of doc.mechanisms) lines.push(...mechanismSection(mechanism));
  lines.push('\\end{document}');
  return `${lines.join('\n')}\n`;
}
