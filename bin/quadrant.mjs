#!/usr/bin/env node
// The `quadrant` command-line tool: loads server/cli/main.ts through tsx in this same process.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../server/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
