/** One measured figure, printed beside its baseline (the floor or a peer measured in the same run). */
export interface BenchRow {
  group: string;
  name: string;
  value: number;
  unit: string;
  baseline?: { name: string; value: number; unit: string };
  target?: string;
}

/** A bench module: measures and returns its rows; it never asserts. */
export type BenchSuite = () => Promise<BenchRow[]>;
