/**
 * A set of 64-bit row fingerprints (two 32-bit halves) in open-addressing typed arrays: about
 * 16 bytes per row, no per-entry objects, so a million rows cost ~32 MB at most.
 */
export class RowHashSet {
  private hi = new Uint32Array(1 << 16);
  private lo = new Uint32Array(1 << 16);
  private used = new Uint8Array(1 << 16);
  private size = 0;

  /**
   * Adds a fingerprint.
   * @param h1 - first 32-bit half
   * @param h2 - second 32-bit half
   * @returns true when it was new, false when it was already present
   * @example
   * const set = new RowHashSet(); set.add(1, 2); // true
   */
  add(h1: number, h2: number): boolean {
    if ((this.size + 1) * 2 > this.used.length) this.grow();
    const fresh = this.insert(h1 >>> 0, h2 >>> 0);
    if (fresh) this.size++;
    return fresh;
  }

  private insert(h1: number, h2: number): boolean {
    const mask = this.used.length - 1;
    // h2 mixes the slot so that rows whose first halves collide still spread out.
    let i = (h1 ^ Math.imul(h2, 0x9e3779b1)) & mask;
    while (this.used[i]) {
      if (this.hi[i] === h1 && this.lo[i] === h2) return false;
      i = (i + 1) & mask;
    }
    this.used[i] = 1;
    this.hi[i] = h1;
    this.lo[i] = h2;
    return true;
  }

  private grow(): void {
    const { hi, lo, used } = this;
    const size = used.length * 2;
    this.hi = new Uint32Array(size);
    this.lo = new Uint32Array(size);
    this.used = new Uint8Array(size);
    for (let i = 0; i < used.length; i++) if (used[i]) this.insert(hi[i], lo[i]);
  }
}
