/** What every `quadrant` command provides, and the I/O it is given (so tests can run commands in-process). */
export interface CliIO {
  out(text: string): void;
  err(text: string): void;
  readFile(path: string): Uint8Array;
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

/** Splits arguments into flags (--name or --name=value) and positionals. */
export function parseArgs(args: string[]): { flags: Map<string, string | true>; positional: string[] } {
  const flags = new Map<string, string | true>();
  const positional: string[] = [];
  for (const a of args) {
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      if (eq > 0) flags.set(a.slice(2, eq), a.slice(eq + 1));
      else flags.set(a.slice(2), true);
    } else positional.push(a);
  }
  return { flags, positional };
}
