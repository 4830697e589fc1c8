/**
 * Standard Young tableaux of one shape, stepped in place: the word w (w[m] = row of the
 * entry m+1, a lattice word of content λ) moves to its lexicographic successor, and the
 * rows follow (entries above the changed position leave the row ends and come back).
 * The order equals that of standard-tableaux' generate.
 */
import type { Partition } from '../../src/core/partitions.js';

export class SytWalk {
  readonly rows: number[][];
  private readonly w: number[];
  private readonly counts: number[];

  constructor(private readonly shape: Partition) {
    const n = shape.reduce((a, b) => a + b, 0);
    this.rows = shape.map(() => []);
    this.w = new Array<number>(n).fill(0);
    this.counts = new Array<number>(shape.length).fill(0);
    this.complete(0);
  }

  private addable(r: number): boolean {
    return this.counts[r]! < this.shape[r]! && (r === 0 || this.counts[r - 1]! > this.counts[r]!);
  }

  /** Greedy smallest completion: each entry from `from` on goes to the highest addable row. */
  private complete(from: number): void {
    for (let m = from; m < this.w.length; m++) {
      let r = 0;
      while (!this.addable(r)) r++;
      this.w[m] = r;
      this.counts[r]!++;
      this.rows[r]!.push(m + 1);
    }
  }

  /** Steps to the next tableau; false after the last (the walk is then spent). */
  next(): boolean {
    for (let i = this.w.length - 1; i >= 0; i--) {
      const old = this.w[i]!;
      this.counts[old]!--;
      this.rows[old]!.pop(); // entry i+1 is the largest left, so it ends its row
      for (let r = old + 1; r < this.shape.length; r++) {
        if (this.addable(r)) {
          this.w[i] = r;
          this.counts[r]!++;
          this.rows[r]!.push(i + 1);
          this.complete(i + 1);
          return true;
        }
      }
    }
    return false;
  }
}
