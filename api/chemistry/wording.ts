/** `1 note`, `3 notes`: a count with its noun in the singular or plural (English `-s` plurals only). */
export function counted(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? '' : 's'}`;
}
