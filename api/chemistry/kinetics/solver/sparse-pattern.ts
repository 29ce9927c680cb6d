/** Compressed sparse rows: the columns of row i are columns[rowStart[i] .. rowStart[i+1]). */
export interface SparsePattern {
  size: number;
  rowStart: Int32Array;
  columns: Int32Array;
}

/** Writes a CSR matrix into a zeroed dense row-major n×n array, scaled by `scale`. */
export function scatterToDense(pattern: SparsePattern, values: Float64Array, dense: Float64Array, scale: number): void {
  const n = pattern.size;
  for (let i = 0; i < n; i++) {
    for (let p = pattern.rowStart[i]; p < pattern.rowStart[i + 1]; p++) dense[i * n + pattern.columns[p]] += scale * values[p];
  }
}
