import type { ApiError } from '@web/services/http';

/** Messages keyed by the server's field path (`title`, `items.0.revision`). */
export type FieldErrors = Record<string, string>;

interface ValidationIssue {
  path: string[];
  message: string;
}

const ITEM_PATH = /^items\.(\d+)\./;

/** "Choose a mechanism" at items.1.mechanism reads "Mechanism 2: choose a mechanism". */
function placed(path: string, message: string): string {
  const item = ITEM_PATH.exec(path);
  if (!item || message.startsWith('Mechanism ')) return message;
  return `Mechanism ${Number(item[1]) + 1}: ${message.charAt(0).toLowerCase()}${message.slice(1)}`;
}

/**
 * The set editor's field messages from a refused save: the validation issues (400) or the field
 * a 404/422 names. Whatever names no field is left to the form's general message.
 */
export function fieldErrorsOf(error: ApiError): FieldErrors {
  const errors: FieldErrors = {};
  const details = error.details as ValidationIssue[] | { field?: string } | undefined;
  if (Array.isArray(details)) {
    for (const issue of details) {
      const path = issue.path.join('.');
      errors[path] ??= placed(path, issue.message);
    }
  } else if (details?.field) {
    errors[details.field] = placed(details.field, error.message);
  }
  return errors;
}
