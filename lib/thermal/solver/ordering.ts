import { scratch } from "./scratch";

/**
 * Where the LU factors of the network's matrix can be non-zero, in solver order: row k of
 * U (and, the pattern being symmetric, column k of L) holds the columns upper[ptr[k]..ptr[k+1]),
 * ascending. It is the set of neighbours node k still has when it is eliminated.
 */
export interface FillPattern {
  ptr: Int32Array;
  upper: Int32Array;
  /** The same entries by rows of L: row i holds the columns lower[lowerPtr[i]..lowerPtr[i+1]), ascending. */
  lowerPtr: Int32Array;
  lower: Int32Array;
}

export interface EliminationOrder {
  /** order[k] is the original index of the node eliminated k-th (solver index k). */
  order: Int32Array;
  /** The inverse: solverIndex[order[k]] = k. */
  solverIndex: Int32Array;
  pattern: FillPattern;
}

const popcount = (x: number) => {
  x -= (x >>> 1) & 0x55555555;
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  return (((x + (x >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
};

/** Neighbours of node i not yet eliminated. (Module-level rather than a closure per call: set-up time counts for small networks.) */
function aliveDegree(adj: Uint32Array, alive: Uint32Array, words: number, i: number): number {
  let d = 0;
  for (let w = 0; w < words; w++) d += popcount(adj[i * words + w]! & alive[w]!);
  return d;
}

/**
 * Minimum-degree elimination order of the node graph, so the LU factorisation of the
 * conductance matrix creates little fill, and the fill pattern it leaves (the factor then
 * visits only those entries). Adjacency is held as bitsets: eliminating a node ORs its row
 * into its neighbours' rows, which keeps the worst case (500 densely linked nodes) to a
 * few million word operations. `ends` holds each link's two node indices in turn (−1: ambient).
 */
export function minimumDegreeOrder(n: number, ends: Int32Array): EliminationOrder {
  const mark = scratch.mark();
  try {
    return eliminate(n, ends);
  } finally {
    scratch.release(mark);
  }
}

function eliminate(n: number, ends: Int32Array): EliminationOrder {
  const words = (n + 31) >>> 5;
  const adj = scratch.words(n * words);
  for (let e = 0; e < ends.length; e += 2) {
    const i = ends[e]!;
    const j = ends[e + 1]!;
    if (i === j || i < 0 || j < 0) continue;
    adj[i * words + (j >>> 5)]! |= 1 << (j & 31);
    adj[j * words + (i >>> 5)]! |= 1 << (i & 31);
  }
  const alive = scratch.words(words);
  for (let i = 0; i < n; i++) alive[i >>> 5]! |= 1 << (i & 31);
  const degree = scratch.ints(n);
  for (let i = 0; i < n; i++) degree[i] = aliveDegree(adj, alive, words, i);
  const order = scratch.ints(n);
  const ptr = scratch.ints(n + 1);
  const fill: number[] = [];
  for (let k = 0; k < n; k++) {
    let best = -1;
    for (let i = 0; i < n; i++) if ((alive[i >>> 5]! & (1 << (i & 31))) !== 0 && (best < 0 || degree[i]! < degree[best]!)) best = i;
    order[k] = best;
    alive[best >>> 5]! &= ~(1 << (best & 31));
    const row = best * words;
    for (let w = 0; w < words; w++) {
      let bits = adj[row + w]! & alive[w]!;
      while (bits !== 0) {
        const bit = bits & -bits;
        bits ^= bit;
        fill.push((w << 5) + (31 - Math.clz32(bit)));
      }
    }
    ptr[k + 1] = fill.length;
    for (let w = 0; w < words; w++) {
      let bits = adj[row + w]! & alive[w]!;
      while (bits !== 0) {
        const bit = bits & -bits;
        const u = (w << 5) + (31 - Math.clz32(bit));
        bits ^= bit;
        const urow = u * words;
        for (let x = 0; x < words; x++) adj[urow + x]! |= adj[row + x]!;
        adj[urow + (u >>> 5)]! &= ~(1 << (u & 31));
      }
    }
    for (let w = 0; w < words; w++) {
      let bits = adj[row + w]! & alive[w]!;
      while (bits !== 0) {
        const bit = bits & -bits;
        bits ^= bit;
        const u = (w << 5) + (31 - Math.clz32(bit));
        degree[u] = aliveDegree(adj, alive, words, u);
      }
    }
  }
  return solverPattern(order, ptr, fill);
}

/**
 * Renumbers the recorded neighbours from original to solver indices, sorts each row, and
 * transposes them into the rows of L. Everything kept lives in one buffer (see scratch.ts
 * for why that matters).
 */
function solverPattern(scratchOrder: Int32Array, scratchPtr: Int32Array, fill: number[]): EliminationOrder {
  const n = scratchOrder.length;
  const nnz = fill.length;
  const store = new Int32Array(4 * n + 2 + 2 * nnz);
  let used = 0;
  const view = (length: number) => store.subarray(used, (used += length));
  const order = view(n);
  order.set(scratchOrder);
  const at = view(n);
  for (let k = 0; k < n; k++) at[order[k]!] = k;
  const ptr = view(n + 1);
  ptr.set(scratchPtr);
  const upper = view(nnz);
  const lowerPtr = view(n + 1);
  const lower = view(nnz);
  for (let k = 0; k < n; k++) {
    const p0 = ptr[k]!;
    const p1 = ptr[k + 1]!;
    for (let p = p0; p < p1; p++) {
      upper[p] = at[fill[p]!]!;
      lowerPtr[upper[p]! + 1]!++;
    }
    // Most rows are a node's two or three neighbours: an insertion sort in place beats a sort call.
    if (p1 - p0 > 32) upper.subarray(p0, p1).sort();
    else {
      for (let p = p0 + 1; p < p1; p++) {
        const v = upper[p]!;
        let q = p;
        for (; q > p0 && upper[q - 1]! > v; q--) upper[q] = upper[q - 1]!;
        upper[q] = v;
      }
    }
  }
  for (let i = 0; i < n; i++) lowerPtr[i + 1]! += lowerPtr[i]!;
  const next = scratch.ints(n);
  next.set(lowerPtr.subarray(0, n));
  // Columns k ascending, so each row of L comes out sorted.
  for (let k = 0; k < n; k++) for (let p = ptr[k]!; p < ptr[k + 1]!; p++) lower[next[upper[p]!]!++] = k;
  return { order, solverIndex: at, pattern: { ptr, upper, lowerPtr, lower } };
}
