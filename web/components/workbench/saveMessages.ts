import { SOURCE_MAX_CHARACTERS } from '@api/revisions/revisions.schemas';
import { fieldErrorsOf } from '@web/services/validation';

const count = new Intl.NumberFormat('en-GB');

/** "1,160,000 characters; a revision holds at most 500,000" when a text is too long to save, else null. */
export function sourceSizeProblem(length: number): string | null {
  if (length <= SOURCE_MAX_CHARACTERS) return null;
  return `${count.format(length)} characters; a revision holds at most ${count.format(SOURCE_MAX_CHARACTERS)}`;
}

const sentence = (text: string) => {
  const trimmed = text.trim();
  const capital = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
};

/**
 * Why a save failed, in plain punctuated sentences: a refused field gives its own message (not the
 * validator's "Invalid input — source:" summary), anything else the server's message.
 */
export function saveFailureMessage(error: Error): string {
  const fields = Object.values(fieldErrorsOf(error));
  const reasons = fields.length > 0 ? fields.map(sentence).join(' ') : sentence(error.message);
  return `Not saved: ${reasons} Your text is kept in this browser.`;
}
