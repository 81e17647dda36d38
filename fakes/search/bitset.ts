// Sets of document slots (see slots.ts) as bits, 32 slots a word: the filter
// index answers with one, so AND / OR / NOT over 100k documents are a few
// thousand word operations instead of a pass over every document per condition.

export class Bitset {
  readonly words: Uint32Array;

  constructor(
    readonly size: number,
    words?: Uint32Array,
  ) {
    this.words = words ?? new Uint32Array((size + 31) >>> 5);
  }

  has(i: number): boolean {
    return i < this.size && (this.words[i >>> 5]! & (1 << (i & 31))) !== 0;
  }

  add(i: number): void {
    this.words[i >>> 5]! |= 1 << (i & 31);
  }

  delete(i: number): void {
    this.words[i >>> 5]! &= ~(1 << (i & 31));
  }

  clone(): Bitset {
    return new Bitset(this.size, this.words.slice());
  }

  /** A copy holding `size` slots (new slots unset), for sets that grow with the index. */
  resized(size: number): Bitset {
    const out = new Bitset(size);
    out.words.set(this.words.subarray(0, Math.min(this.words.length, out.words.length)));
    return out;
  }

  /** In place: keeps only what `other` also holds. */
  and(other: Bitset): this {
    const w = this.words;
    const o = other.words;
    for (let i = 0; i < w.length; i++) w[i]! &= o[i] ?? 0;
    return this;
  }

  /** In place: adds what `other` holds. */
  or(other: Bitset): this {
    const w = this.words;
    const o = other.words;
    for (let i = 0; i < w.length && i < o.length; i++) w[i]! |= o[i]!;
    return this;
  }

  /** In place: drops what `other` holds. */
  andNot(other: Bitset): this {
    const w = this.words;
    const o = other.words;
    for (let i = 0; i < w.length && i < o.length; i++) w[i]! &= ~o[i]!;
    return this;
  }

  count(): number {
    let n = 0;
    for (let v of this.words) {
      v -= (v >>> 1) & 0x55555555;
      v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
      n += (((v + (v >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
    }
    return n;
  }
}
