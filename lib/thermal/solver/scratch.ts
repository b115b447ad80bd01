/**
 * Temporary integer storage for the set-up steps (ordering, reachability), carved from one
 * growable buffer. In V8 every typed array over 64 bytes gets its own off-heap backing
 * store, about a microsecond each here; compiling a 20-node network needed some twenty of
 * them, half the cost of a whole steady solve. A view into a shared buffer costs a tenth.
 *
 * Use: `const mark = scratch.mark(); try { … scratch.ints(n) … } finally { scratch.release(mark); }`.
 * Views must not outlive the release. Growing keeps earlier views valid (they keep the old buffer).
 */
class ScratchInts {
  private buffer = new ArrayBuffer(1 << 14);
  private top = 0;

  mark(): number {
    return this.top;
  }

  release(mark: number): void {
    this.top = mark;
  }

  /** `length` zeroed 32-bit slots. */
  ints(length: number): Int32Array {
    const at = this.take(length);
    return new Int32Array(this.buffer, at, length).fill(0);
  }

  /** The same as unsigned words, for bitsets. */
  words(length: number): Uint32Array {
    const at = this.take(length);
    return new Uint32Array(this.buffer, at, length).fill(0);
  }

  /** Byte offset of `length` free slots (growing the buffer if needed). */
  private take(length: number): number {
    const bytes = 4 * length;
    if (this.top + bytes > this.buffer.byteLength) {
      this.buffer = new ArrayBuffer(Math.max(2 * this.buffer.byteLength, bytes));
      this.top = 0;
    }
    const at = this.top;
    this.top += bytes;
    return at;
  }
}

export const scratch = new ScratchInts();
