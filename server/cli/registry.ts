/**
 * The command registry of the `quadrant` command-line tool. Adding a command is one line here plus its
 * module in commands/<name>.ts exporting a CliCommand.
 */
import type { CliCommand } from './command.js';
import { analyzeCommand } from './commands/analyze.js';
import { domainCommand } from './commands/domain.js';
import { templateCommand } from './commands/template.js';
import { twistCommand } from './commands/twist.js';
import { subdivideCommand } from './commands/subdivide.js';

export const COMMANDS: CliCommand[] = [
  analyzeCommand,
  domainCommand,
  templateCommand,
  twistCommand,
  subdivideCommand,
];
