import { describe, expect, it } from 'vitest';
import { saveFailureMessage, sourceSizeProblem } from '@web/components/workbench/saveMessages';
import { ApiError } from '@web/services/http';

describe('the text size limit', () => {
  it('says nothing up to 500,000 characters and names the size above it', () => {
    expect(sourceSizeProblem(500_000)).toBeNull();
    expect(sourceSizeProblem(1_160_000)).toBe('1,160,000 characters; a revision holds at most 500,000');
  });
});

describe('the message of a failed save', () => {
  it('gives a refused field’s own message, punctuated, without the validator’s prefix', () => {
    const refused = new ApiError(400, 'VALIDATION_FAILED', 'Invalid input — source: A revision holds at most 500,000 characters', [
      { path: ['source'], message: 'A revision holds at most 500,000 characters' },
    ]);
    expect(saveFailureMessage(refused)).toBe('Not saved: A revision holds at most 500,000 characters. Your text is kept in this browser.');
  });

  it('keeps any other reason as the server gave it, ending in a full stop', () => {
    expect(saveFailureMessage(new ApiError(0, 'NETWORK_ERROR', 'The Cyclewright server could not be reached.')))
      .toBe('Not saved: The Cyclewright server could not be reached. Your text is kept in this browser.');
    expect(saveFailureMessage(new Error('the text has 1,160,000 characters; a revision holds at most 500,000')))
      .toBe('Not saved: The text has 1,160,000 characters; a revision holds at most 500,000. Your text is kept in this browser.');
  });
});
