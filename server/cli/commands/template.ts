/**
 * `quadrant template KIND ... --out FILE.obj`: builds a built-in diagram (lens space, S^3, #^g S^1 x S^2,
 * grid diagram, torus curve) and writes it as OBJ. Also holds the small file helpers shared by the
 * `twist` and `subdivide` commands. Exit codes: 0 success, 1 invalid input, 2 usage error.
 */
import { writeFileSync } from 'node:fs';
import { buildTemplate, parseDiagramFile, writeObj, type HeegaardDiagram, type Problem, type TemplateSpec } from '../../../geometry/index.js';
import type { CliCommand, CliIO } from '../command.js';

const USAGE = 'lens --p P --q Q | s3 --genus G | s1xs2 --genus G | grid --x PERM --o PERM | torus-curve --p P --q Q  [--resolution N] --out FILE.obj';

/** Problems as indented lines. */
export const problemText = (problems: Problem[]): string => problems.map((p) => `  ${p.message}`).join('\n');

/** Writes a diagram as OBJ to `out` (must end in .obj); returns an error message or null. */
export function writeDiagram(io: CliIO, out: string, d: HeegaardDiagram, comment: string): string | null {
  if (!/\.obj$/i.test(out)) return `the output file must end in .obj (got ${out})`;
  const text = writeObj(d, comment);
  const w = (io as CliIO & { writeFile?: (p: string, t: string) => void }).writeFile;
  try {
    if (w) w(out, text); else writeFileSync(out, text);
  } catch (e) {
    return `cannot write ${out}${(e as { code?: string }).code ? ` (${(e as { code?: string }).code})` : ''}`;
  }
  return null;
}

/** Reads and validates a diagram file; prints problems and returns null on failure. */
export function readDiagram(io: CliIO, cmd: string, file: string): HeegaardDiagram | null {
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
    io.err(`quadrant ${cmd}: ${file} is not a valid Heegaard diagram:\n${problemText(parsed.errors)}`);
    return null;
  }
  return parsed.value.diagram;
}

/**
 * Splits arguments into flags and positionals; flags named in `valued` take a value either as
 * --name=value or as the next argument (--name value).
 */
export function parseOptions(args: string[], valued: string[]): { flags: Map<string, string | true>; positional: string[] } {
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
    io.err(`quadrant template: cannot build this diagram:\n${problemText(built.errors)}`);
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
