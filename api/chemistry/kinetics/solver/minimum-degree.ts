import type { SparsePattern } from './sparse-pattern';

function symmetricNeighbours(pattern: SparsePattern): Set<number>[] {
  const neighbours = Array.from({ length: pattern.size }, () => new Set<number>());
  for (let i = 0; i < pattern.size; i++) {
    for (let p = pattern.rowStart[i]; p < pattern.rowStart[i + 1]; p++) {
      const j = pattern.columns[p];
      if (i === j) continue;
      neighbours[i].add(j);
      neighbours[j].add(i);
    }
  }
  return neighbours;
}

function leastConnected(neighbours: Set<number>[], done: Uint8Array): number {
  let best = -1;
  for (let v = 0; v < neighbours.length; v++) {
    if (!done[v] && (best < 0 || neighbours[v].size < neighbours[best].size)) best = v;
  }
  return best;
}

/**
 * A fill-reducing elimination order for the pattern of I + J (greedy minimum degree on the
 * symmetrised graph; George & Liu, Computer Solution of Large Sparse Positive Definite Systems,
 * ch. 5). Eliminating a species joins all its neighbours, so the ones with fewest links go first
 * and the hubs (O3, OH, …) last. Returns order[k] = the species eliminated k-th.
 */
export function minimumDegreeOrder(pattern: SparsePattern): Int32Array {
  const neighbours = symmetricNeighbours(pattern);
  const done = new Uint8Array(pattern.size);
  const order = new Int32Array(pattern.size);
  for (let k = 0; k < pattern.size; k++) {
    const v = leastConnected(neighbours, done);
    order[k] = v;
    done[v] = 1;
    const linked = [...neighbours[v]];
    for (const a of linked) {
      neighbours[a].delete(v);
      for (const b of linked) if (a !== b) neighbours[a].add(b);
    }
    neighbours[v].clear();
  }
  return order;
}
