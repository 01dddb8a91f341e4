/** What every `quadrant` command provides, and the I/O it is given (so tests can run commands in-process). */
import { parseDiagramFile, writeObj, type HeegaardDiagram, type ParsedDiagramFile, type Problem } from '../../geometry/index.js';

export interface CliIO {
  out(text: string): void;
  err(text: string): void;
  readFile(path: string): Uint8Array;
  writeFile(path: string, text: string): void;
}

export interface CliCommand {
  /** The word after `quadrant`, e.g. 'analyze'. */
  name: string;
  /** Argument synopsis, e.g. 'FILE [--json]'. */
  usage: string;
  /** One line for `quadrant --help`. */
  summary: string;
  /** Runs the command; returns the process exit code (0 success, 1 invalid input, 2 usage error). */
  run(args: string[], io: CliIO): number | Promise<number>;
}

/**
 * Splits arguments into flags and positionals; flags named in `valued` take a value either as
 * --name=value or as the next argument (--name value); other flags are --name or --name=value.
 */
export function parseOptions(args: string[], valued: readonly string[] = []): { flags: Map<string, string | true>; positional: string[] } {
  const flags = new Map<string, string | true>();
  const positional: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (!a.startsWith('--')) { positional.push(a); continue; }
    const eq = a.indexOf('=');
    if (eq > 0) { flags.set(a.slice(2, eq), a.slice(eq + 1)); continue; }
    const name = a.slice(2);
    if (valued.includes(name) && i + 1 < args.length && !args[i + 1].startsWith('--')) flags.set(name, args[++i]);
    else flags.set(name, true);
  }
  return { flags, positional };
}

/** One indented line per problem, with the file line or byte offset when known. */
export function problemLines(file: string, problems: Problem[]): string {
  const where = (p: Problem) => (p.line !== undefined ? `:${p.line}` : p.offset !== undefined ? ` (byte ${p.offset})` : '');
  return problems.map((p) => `  ${file}${where(p)}: ${p.message}`).join('\n');
}

/** Reads and validates a diagram file; prints the problems (exit code 1 for the caller) and returns null on failure. */
export function readDiagramFile(io: CliIO, cmd: string, file: string): ParsedDiagramFile | null {
  let bytes: Uint8Array;
  try {
    bytes = io.readFile(file);
  } catch (e) {
    const code = (e as { code?: string }).code;
    io.err(`quadrant ${cmd}: cannot read ${file}${code === 'ENOENT' ? ': no such file' : code ? ` (${code})` : ''}`);
    return null;
  }
  const parsed = parseDiagramFile(file, bytes);
  if (!parsed.ok) {
    io.err(`quadrant ${cmd}: ${file} is not a valid Heegaard diagram:\n${problemLines(file, parsed.errors)}`);
    return null;
  }
  if (parsed.value.warnings.length) io.err(`warnings:\n${problemLines(file, parsed.value.warnings)}`);
  return parsed.value;
}

/** Writes a diagram as OBJ to `out` (must end in .obj); returns an error message or null. */
export function writeDiagram(io: CliIO, out: string, d: HeegaardDiagram, comment: string): string | null {
  if (!/\.obj$/i.test(out)) return `the output file must end in .obj (got ${out})`;
  try {
    io.writeFile(out, writeObj(d, comment));
  } catch (e) {
    const code = (e as { code?: string }).code;
    return `cannot write ${out}${code ? ` (${code})` : ''}`;
  }
  return null;
}
