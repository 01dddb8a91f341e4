/**
 * Value sources for the body of a PLY file (Turk 1994, "The PLY Polygon File Format"): whitespace-separated
 * ASCII tokens with line numbers, or binary little/big-endian values with byte offsets. Both throw
 * FileProblem (caught at the reader's edge) with the position of the failure.
 */
import { FileProblem } from './text.js';

export type PlyType = 'int8' | 'uint8' | 'int16' | 'uint16' | 'int32' | 'uint32' | 'float32' | 'float64';

/** PLY type names, both the original and the sized spellings. */
export const PLY_TYPES: Record<string, PlyType> = {
  char: 'int8', int8: 'int8', uchar: 'uint8', uint8: 'uint8', short: 'int16', int16: 'int16',
  ushort: 'uint16', uint16: 'uint16', int: 'int32', int32: 'int32', uint: 'uint32', uint32: 'uint32',
  float: 'float32', float32: 'float32', double: 'float64', float64: 'float64',
};

const SIZE: Record<PlyType, number> = { int8: 1, uint8: 1, int16: 2, uint16: 2, int32: 4, uint32: 4, float32: 4, float64: 8 };

export interface PlySource {
  /** Names the element instance being read (for messages); call before its first value. */
  begin(element: string, index: number): void;
  /** Reads one value of the current instance. */
  read(type: PlyType): number;
  /** "face 12" (0-based, as PLY numbers elements). */
  what(): string;
  /** For ASCII: moves to the next line (one element instance per line). */
  endInstance(): void;
  /** Where we are: line (ASCII) or byte offset (binary), for messages. */
  line?: number;
  offset?: number;
  fail(code: string, message: string): never;
}

/** ASCII body: tokens separated by spaces, one element instance per line. */
export class AsciiPlySource implements PlySource {
  pos: number;
  line: number;
  private element = '';
  private index = 0;
  constructor(private readonly text: string, start: number, firstLine: number) {
    this.pos = start;
    this.line = firstLine;
  }

  begin(element: string, index: number): void {
    this.element = element; this.index = index;
  }

  what(): string {
    return `${this.element} ${this.index}`;
  }

  read(type: PlyType): number {
    const t = this.text;
    let i = this.pos;
    while (i < t.length && (t.charCodeAt(i) === 32 || t.charCodeAt(i) === 9 || t.charCodeAt(i) === 13)) i++;
    if (i >= t.length || t.charCodeAt(i) === 10) this.fail(i >= t.length ? 'truncated' : 'bad-number', i >= t.length ? `Line ${this.line}: the file ends inside ${this.what()}.` : `Line ${this.line}: ${this.what()} has too few values.`);
    let j = i;
    while (j < t.length && t.charCodeAt(j) > 32) j++;
    this.pos = j;
    const tok = t.slice(i, j), x = Number(tok);
    if (!Number.isFinite(x)) this.fail('bad-number', `Line ${this.line}: ${this.what()}: '${tok}' is not a number.`);
    if (type !== 'float32' && type !== 'float64' && !Number.isInteger(x)) this.fail('bad-number', `Line ${this.line}: ${this.what()}: '${tok}' should be a whole number.`);
    return x;
  }

  endInstance(): void {
    const t = this.text;
    const nl = t.indexOf('\n', this.pos);
    this.pos = nl < 0 ? t.length : nl + 1;
    this.line++;
  }

  fail(code: string, message: string): never {
    throw new FileProblem(code, message, this.line);
  }
}

/** Binary body with explicit endianness. */
export class BinaryPlySource implements PlySource {
  private readonly dv: DataView;
  private element = '';
  private index = 0;
  private start = 0;
  constructor(bytes: Uint8Array, public offset: number, private readonly little: boolean) {
    this.dv = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  begin(element: string, index: number): void {
    this.element = element; this.index = index; this.start = this.offset;
  }

  what(): string {
    return `${this.element} ${this.index}`;
  }

  read(type: PlyType): number {
    const o = this.offset, n = SIZE[type];
    if (o + n > this.dv.byteLength) this.fail('truncated', `Byte ${this.dv.byteLength}: the file ends inside ${this.what()}, which starts at byte ${this.start}.`);
    this.offset = o + n;
    const dv = this.dv, le = this.little;
    switch (type) {
      case 'int8': return dv.getInt8(o);
      case 'uint8': return dv.getUint8(o);
      case 'int16': return dv.getInt16(o, le);
      case 'uint16': return dv.getUint16(o, le);
      case 'int32': return dv.getInt32(o, le);
      case 'uint32': return dv.getUint32(o, le);
      case 'float32': return this.finite(dv.getFloat32(o, le), o);
      case 'float64': return this.finite(dv.getFloat64(o, le), o);
    }
  }

  private finite(x: number, o: number): number {
    if (!Number.isFinite(x)) throw new FileProblem('bad-number', `Byte ${o}: ${this.what()} holds a value that is not a finite number.`, undefined, o);
    return x;
  }

  endInstance(): void {}

  fail(code: string, message: string): never {
    throw new FileProblem(code, message, undefined, code === 'truncated' ? this.dv.byteLength : this.offset);
  }
}
