/**
 * The command registry of the `quadrant` command-line tool. Adding a command is one line here plus its
 * module in commands/<name>.ts exporting a CliCommand.
 */
import type { CliCommand } from './command.js';
import { analyzeCommand } from './commands/analyze.js';
import { domainCommand } from './commands/domain.js';

export const COMMANDS: CliCommand[] = [
  analyzeCommand,
  domainCommand,
];
