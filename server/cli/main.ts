/**
 * Entry of the `quadrant` command-line tool (bin/quadrant.mjs loads it through tsx). Dispatches to the
 * commands of registry.ts; never prints a stack trace for user errors.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import type { CliIO } from './command.js';
import { COMMANDS } from './registry.js';

export const nodeIO: CliIO = {
  out: (t) => { process.stdout.write(t.endsWith('\n') ? t : `${t}\n`); },
  err: (t) => { process.stderr.write(t.endsWith('\n') ? t : `${t}\n`); },
  readFile: (p) => readFileSync(p),
  writeFile: (p, t) => writeFileSync(p, t),
};

function help(): string {
  return [
    'quadrant — Heegaard diagrams on triangulated surfaces',
    '',
    'Usage: quadrant COMMAND [ARGS]',
    '',
    'Commands:',
    ...COMMANDS.flatMap((c) => [`  ${c.name} ${c.usage}`, `      ${c.summary}`]),
    '',
    'quadrant COMMAND --help shows one command.',
  ].join('\n');
}

/** Runs the tool with the arguments after `quadrant`; returns the exit code. */
export async function main(argv: string[], io: CliIO = nodeIO): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(help());
    return name === undefined ? 2 : 0;
  }
  const cmd = COMMANDS.find((c) => c.name === name);
  if (!cmd) {
    io.err(`quadrant: unknown command '${name}'.\n\n${help()}`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.out(`Usage: quadrant ${cmd.name} ${cmd.usage}\n\n${cmd.summary}`);
    return 0;
  }
  try {
    return await cmd.run(rest, io);
  } catch (e) {
    // A bug, not a user error: one line, no stack unless asked for.
    io.err(`quadrant ${cmd.name}: internal error: ${e instanceof Error ? e.message : String(e)}`);
    if (process.env.QUADRANT_DEBUG) io.err(e instanceof Error ? e.stack ?? '' : '');
    return 70;
  }
}
