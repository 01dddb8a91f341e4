/**
 * `quadrant template KIND ... --out FILE.obj`: builds a built-in diagram (lens space, S^3, #^g S^1 x S^2,
 * grid diagram, torus curve) and writes it as OBJ. Exit codes: 0 success, 1 invalid input, 2 usage error.
 */
import { buildTemplate, type TemplateSpec } from '../../../geometry/index.js';
import { parseOptions, problemLines, writeDiagram, type CliCommand, type CliIO } from '../command.js';

const USAGE = 'lens --p P --q Q | s3 --genus G | s1xs2 --genus G | grid --x PERM --o PERM | torus-curve --p P --q Q  [--resolution N] --out FILE.obj';

const intFlag = (flags: Map<string, string | true>, name: string): number | string | undefined => {
  const v = flags.get(name);
  if (v === undefined) return undefined;
  if (v === true || !/^-?\d+$/.test(v.trim())) return `--${name} needs a whole number`;
  return Number(v);
};

/** Parses the template arguments into a spec, or a usage message. */
export function templateSpec(args: string[]): { spec: TemplateSpec; out: string } | string {
  const { flags, positional } = parseOptions(args, ['p', 'q', 'genus', 'x', 'o', 'out', 'resolution']);
  const out = flags.get('out');
  if (positional.length !== 1) return 'name one template: lens, s3, s1xs2, grid or torus-curve';
  if (typeof out !== 'string') return '--out FILE.obj is required';
  const kind = positional[0];
  const allowed: Record<string, string[]> = { lens: ['p', 'q'], 'torus-curve': ['p', 'q'], s3: ['genus'], s1xs2: ['genus'], grid: ['x', 'o'] };
  if (!allowed[kind]) return `unknown template '${kind}'; use lens, s3, s1xs2, grid or torus-curve`;
  for (const f of flags.keys()) if (![...allowed[kind], 'out', 'resolution'].includes(f)) return `unknown option --${f} for ${kind}`;
  const nums: Record<string, number> = {};
  for (const f of [...allowed[kind].filter((x) => x !== 'x' && x !== 'o'), 'resolution']) {
    const v = intFlag(flags, f);
    if (typeof v === 'string') return v;
    if (v === undefined) { if (f !== 'resolution') return `--${f} is required for ${kind}`; continue; }
    nums[f] = v;
  }
  const resolution = nums.resolution;
  if (kind === 'grid') {
    const perms: number[][] = [];
    for (const f of ['x', 'o']) {
      const v = flags.get(f);
      if (typeof v !== 'string' || !/^\s*\d+(\s*,\s*\d+)*\s*$/.test(v)) return `--${f} needs a comma-separated list of 0-based rows, one per column (e.g. --${f} 1,2,0)`;
      perms.push(v.split(',').map((s) => Number(s.trim())));
    }
    return { spec: { kind: 'grid', x: perms[0], o: perms[1], resolution }, out };
  }
  if (kind === 'lens' || kind === 'torus-curve') return { spec: { kind, p: nums.p, q: nums.q, resolution }, out };
  return { spec: { kind: kind as 's3' | 's1xs2', genus: nums.genus, resolution }, out };
}

async function run(args: string[], io: CliIO): Promise<number> {
  const parsed = templateSpec(args);
  if (typeof parsed === 'string') {
    io.err(`quadrant template: ${parsed}\nUsage: quadrant template ${USAGE}`);
    return 2;
  }
  const built = buildTemplate(parsed.spec);
  if (!built.ok) {
    io.err(`quadrant template: cannot build this diagram:\n${problemLines('template', built.errors)}`);
    return 1;
  }
  const why = writeDiagram(io, parsed.out, built.value, `Quadrant template ${JSON.stringify(parsed.spec)}`);
  if (why) { io.err(`quadrant template: ${why}`); return 1; }
  const d = built.value;
  io.out(`wrote ${parsed.out}: ${d.mesh.nV} vertices, ${d.mesh.nF} triangles, ${d.curves.length} curves, ${d.basepoints.length} basepoint${d.basepoints.length === 1 ? '' : 's'}`);
  return 0;
}

export const templateCommand: CliCommand = {
  name: 'template',
  usage: USAGE,
  summary: 'build a built-in diagram (lens space, S^3, #^g S^1 x S^2, grid diagram, torus curve) as OBJ',
  run,
};
