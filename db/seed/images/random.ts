// A small seeded PRNG (mulberry32): the same seed always draws the same picture, on any machine.
export class Rng {
  private state: number;

  constructor(seed: number) {
    this.state = seed >>> 0 || 0x9e3779b9;
  }

  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }

  range(min: number, max: number): number {
    return min + (max - min) * this.next();
  }

  /** Symmetric wobble around zero, for hand-drawn irregularity. */
  jitter(amount: number): number {
    return (this.next() * 2 - 1) * amount;
  }

  int(min: number, maxInclusive: number): number {
    return Math.floor(this.range(min, maxInclusive + 1));
  }

  chance(p: number): boolean {
    return this.next() < p;
  }

  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)];
  }

  /** An independent stream, so adding a detail in one layer does not reshuffle the others. */
  fork(salt: number): Rng {
    return new Rng(Math.imul(this.state ^ salt, 0x85ebca6b) ^ (salt * 0x27d4eb2d));
  }
}
