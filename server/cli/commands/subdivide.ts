/**
 * `quadrant subdivide FILE [--loop] --out FILE.obj`: 1 -> 4 subdivision of a diagram's surface (midpoint,
 * or Loop 1987 with Warren's weights), carrying the curves along.
 */
import { subdivideDiagram } from '../../../geometry/index.js';
import { parseOptions, problemLines, readDiagramFile, writeDiagram, type CliCommand, type CliIO } from '../command.js';

const USAGE = 'FILE [--loop] --out FILE.obj';

async function run(args: string[], io: CliIO): Promise<number> {
  const { flags, positional } = parseOptions(args, ['out']);
  const unknown = [...flags.keys()].filter((f) => !['loop', 'out'].includes(f));
  const out = flags.get('out');
  if (positional.length !== 1 || unknown.length || typeof out !== 'string') {
    io.err(`${unknown.length ? `quadrant subdivide: unknown option --${unknown[0]}\n` : ''}Usage: quadrant subdivide ${USAGE}`);
    return 2;
  }
  const d = readDiagramFile(io, 'subdivide', positional[0])?.diagram;
  if (!d) return 1;
  const r = subdivideDiagram(d, flags.has('loop') ? 'loop' : 'midpoint');
  if (!r.ok) { io.err(`quadrant subdivide: cannot subdivide:\n${problemLines(positional[0], r.errors)}`); return 1; }
  const why = writeDiagram(io, out, r.value, `Quadrant: ${flags.has('loop') ? 'Loop' : 'midpoint'} subdivision of ${positional[0]}`);
  if (why) { io.err(`quadrant subdivide: ${why}`); return 1; }
  io.out(`wrote ${out}: ${r.value.mesh.nV} vertices, ${r.value.mesh.nF} triangles`);
  return 0;
}

export const subdivideCommand: CliCommand = {
  name: 'subdivide',
  usage: USAGE,
  summary: 'subdivide every triangle into four (midpoint or --loop), carrying the curves along',
  run,
};
