const emptySlot = -1;

/**
 * The code of a level found from a span of a larger text, without cutting the span out: an
 * open-addressing hash table with linear probing over the level texts, hashed with 32-bit FNV-1a
 * over their UTF-16 code units (G. Fowler, L. C. Noll, K.-P. Vo; L. C. Noll's description at
 * http://www.isthe.com/chongo/tech/comp/fnv/). It borrows the caller's list of level texts, which
 * may only grow by appending (`add` after each push). The table doubles when half full.
 * Cost: `find` is O(span length) per probe, expected O(1) probes; memory 8 bytes per level or fewer.
 * @example const levels = ["north"]; const table = new SpanLevels(levels); table.add(0); table.find("a,north,b", 2, 7) // => 0
 */
export class SpanLevels {
  private slots = new Int32Array(64).fill(emptySlot);
  private size = 0;

  constructor(private readonly levels: readonly string[]) {}

  /** Takes in level `code`, the one just appended to the borrowed list. */
  add(code: number): void {
    if (2 * (this.size + 1) > this.slots.length) this.grow();
    this.place(code);
    this.size++;
  }

  /** The code of the level equal to text[start, end), or −1 when there is none. */
  find(text: string, start: number, end: number): number {
    const mask = this.slots.length - 1;
    const length = end - start;
    for (let slot = hashSpan(text, start, end) & mask; ; slot = (slot + 1) & mask) {
      const code = this.slots[slot]!;
      if (code === emptySlot) return -1;
      const level = this.levels[code]!;
      if (level.length !== length) continue;
      let k = 0;
      while (k < length && level.charCodeAt(k) === text.charCodeAt(start + k)) k++;
      if (k === length) return code;
    }
  }

  private place(code: number): void {
    const level = this.levels[code]!;
    const mask = this.slots.length - 1;
    let slot = hashSpan(level, 0, level.length) & mask;
    while (this.slots[slot] !== emptySlot) slot = (slot + 1) & mask;
    this.slots[slot] = code;
  }

  private grow(): void {
    const codes = this.slots.filter((code) => code !== emptySlot);
    this.slots = new Int32Array(this.slots.length * 2).fill(emptySlot);
    for (const code of codes) this.place(code);
  }
}

function hashSpan(text: string, start: number, end: number): number {
  let hash = 0x811c9dc5; // FNV-1a 32-bit offset basis (Noll's FNV page)
  for (let k = start; k < end; ++k) hash = Math.imul(hash ^ text.charCodeAt(k), 0x01000193); // FNV 32-bit prime
  return hash >>> 0;
}
