/** Binary min-heap of (id, key) pairs on growable typed arrays (Williams 1964). push/pop O(log n). */
export class MinHeap {
  private ids = new Int32Array(64);
  private keys = new Float64Array(64);
  size = 0;

  push(id: number, key: number): void {
    if (this.size === this.ids.length) {
      const ids = new Int32Array(2 * this.size), keys = new Float64Array(2 * this.size);
      ids.set(this.ids); keys.set(this.keys);
      this.ids = ids; this.keys = keys;
    }
    let i = this.size++;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (this.keys[p] <= key) break;
      this.ids[i] = this.ids[p]; this.keys[i] = this.keys[p];
      i = p;
    }
    this.ids[i] = id; this.keys[i] = key;
  }

  /** Removes and returns the id with the smallest key (size must be > 0). */
  pop(): number {
    const top = this.ids[0];
    const id = this.ids[--this.size], key = this.keys[this.size];
    let i = 0;
    for (;;) {
      let c = 2 * i + 1;
      if (c >= this.size) break;
      if (c + 1 < this.size && this.keys[c + 1] < this.keys[c]) c++;
      if (this.keys[c] >= key) break;
      this.ids[i] = this.ids[c]; this.keys[i] = this.keys[c];
      i = c;
    }
    this.ids[i] = id; this.keys[i] = key;
    return top;
  }
}
