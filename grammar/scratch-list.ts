/**
 * A list reused for one small job at a time (the terms of one step, the pieces of one equation).
 * It is emptied by resetting a count, not `length = 0`: V8 then frees the list's storage, and the
 * next push allocates it again, on every step of a large text. Entries beyond `size` are stale.
 */
export class ScratchList<T> {
  readonly items: T[] = [];
  size = 0;

  push(item: T): void {
    this.items[this.size] = item;
    this.size += 1;
  }

  at(index: number): T {
    return this.items[index];
  }

  clear(): void {
    this.size = 0;
  }

  /** The entries as a new list of exactly their number. */
  copy(): T[] {
    return this.items.slice(0, this.size);
  }
}
