import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

export const EXAMPLES_DIR = join(import.meta.dirname, '..', '..', 'examples');

/** Every `.steps` file in examples/, with its text and the path of its golden JSON. */
export function exampleFiles(): { name: string; text: string; goldenPath: string }[] {
  return readdirSync(EXAMPLES_DIR)
    .filter((file) => file.endsWith('.steps'))
    .sort()
    .map((file) => ({
      name: file,
      text: readFileSync(join(EXAMPLES_DIR, file), 'utf8'),
      goldenPath: join(EXAMPLES_DIR, file.replace(/\.steps$/, '.json')),
    }));
}

/** Reads one example's text by file name. */
export function exampleText(name: string): string {
  return readFileSync(join(EXAMPLES_DIR, name), 'utf8');
}
