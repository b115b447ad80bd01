/**
 * Minimum-degree elimination order of the node graph, so the LU factorisation of the
 * conductance matrix creates little fill. Adjacency is held as bitsets: eliminating a
 * node ORs its row into its neighbours' rows, which keeps the worst case (500 densely
 * linked nodes) to a few million word operations.
 */
export function minimumDegreeOrder(n: number, edges: readonly (readonly [number, number])[]): Int32Array {
  const words = (n + 31) >>> 5;
  const adj = new Uint32Array(n * words);
  const set = (i: number, j: number) => {
    adj[i * words + (j >>> 5)]! |= 1 << (j & 31);
  };
  for (const [i, j] of edges) {
    if (i === j || i < 0 || j < 0) continue;
    set(i, j);
    set(j, i);
  }
  const alive = new Uint32Array(words);
  for (let i = 0; i < n; i++) alive[i >>> 5]! |= 1 << (i & 31);
  const degree = new Int32Array(n);
  const popcount = (x: number) => {
    x -= (x >>> 1) & 0x55555555;
    x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
    return (((x + (x >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
  };
  const recount = (i: number) => {
    let d = 0;
    for (let w = 0; w < words; w++) d += popcount(adj[i * words + w]! & alive[w]!);
    degree[i] = d;
  };
  for (let i = 0; i < n; i++) recount(i);
  const done = new Uint8Array(n);
  const order = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    let best = -1;
    for (let i = 0; i < n; i++) if (!done[i] && (best < 0 || degree[i]! < degree[best]!)) best = i;
    order[k] = best;
    done[best] = 1;
    alive[best >>> 5]! &= ~(1 << (best & 31));
    const row = best * words;
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
        recount((w << 5) + (31 - Math.clz32(bit)));
      }
    }
  }
  return order;
}
