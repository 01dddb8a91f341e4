/**
 * `quadrant twist FILE --curve NAME --along NAME [--negative] --out FILE.obj`: Dehn twist of one curve
 * along another (Farb–Margalit 2012, ch. 3); curves are named as users see them (alpha_1, beta_2).
 */
import { curveIndexByName, dehnTwist } from '../../../geometry/index.js';
import { parseOptions, problemLines, readDiagramFile, writeDiagram, type CliCommand, type CliIO } from '../command.js';

const USAGE = 'FILE --curve NAME --along NAME [--negative] --out FILE.obj';

async function run(args: string[], io: CliIO): Promise<number> {
  const { flags, positional } = parseOptions(args, ['curve', 'along', 'out']);
  const unknown = [...flags.keys()].filter((f) => !['curve', 'along', 'negative', 'out'].includes(f));
  const curve = flags.get('curve'), along = flags.get('along'), out = flags.get('out');
  if (positional.length !== 1 || unknown.length || typeof curve !== 'string' || typeof along !== 'string' || typeof out !== 'string') {
    io.err(`${unknown.length ? `quadrant twist: unknown option --${unknown[0]}\n` : ''}Usage: quadrant twist ${USAGE}`);
    return 2;
  }
  const d = readDiagramFile(io, 'twist', positional[0])?.diagram;
  if (!d) return 1;
  const c = curveIndexByName(d, curve), a = curveIndexByName(d, along);
  for (const [name, i] of [[curve, c], [along, a]] as const) {
    if (i < 0) {
      io.err(`quadrant twist: ${positional[0]} has no curve '${name}'; its curves are ${d.curves.map((x) => `${x.family}_${x.index + 1}`).join(', ')}`);
      return 1;
    }
  }
  const r = dehnTwist(d, c, a, { negative: flags.has('negative') });
  if (!r.ok) { io.err(`quadrant twist: cannot twist:\n${problemLines(positional[0], r.errors)}`); return 1; }
  const why = writeDiagram(io, out, r.value, `Quadrant: ${curve} twisted ${flags.has('negative') ? 'negatively' : 'positively'} along ${along}`);
  if (why) { io.err(`quadrant twist: ${why}`); return 1; }
  io.out(`wrote ${out}: ${r.value.mesh.nV} vertices, ${r.value.mesh.nF} triangles`);
  return 0;
}

export const twistCommand: CliCommand = {
  name: 'twist',
  usage: USAGE,
  summary: 'Dehn-twist one curve of a diagram along another and write the result as OBJ',
  run,
};
