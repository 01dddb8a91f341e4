/**
 * `quadrant domain FILE --coef V=N [--coef V=N ...] [--from V,V,..] [--to V,..] [--json]`: builds the 2-chain
 * giving the region that contains vertex V the coefficient N (0 elsewhere), decides whether it is a domain
 * from x to y (Ozsváth–Szabó 2004) and prints its Euler measure, n_x, n_y, n_z and Maslov index
 * (Lipshitz 2006). Vertex numbers are as in the file. Input errors: message on stderr, exit 1 (2 for usage).
 */
import {
  analyzeDiagram, checkDomain, curveName, toCombinatorial, vertexLabel,
  type DiagramAnalysis, type DomainCheck, type HeegaardDiagram,
} from '../../../geometry/index.js';
import { problemLines, readDiagramFile, type CliCommand, type CliIO } from '../command.js';

const USAGE = 'FILE --coef V=N [--coef V=N ...] [--from V,V,..] [--to V,V,..] [--json]';

interface DomainArgs { file: string; coefs: [number, number][]; from?: number[]; to?: number[]; json: boolean }

const isInt = (s: string) => /^-?\d+$/.test(s.trim());

/** Parses the arguments; a string is a usage error. */
function parseDomainArgs(args: string[]): DomainArgs | string {
  const out: DomainArgs = { file: '', coefs: [], json: false };
  const files: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    const [flag, inline] = a.startsWith('--') && a.includes('=') && !a.startsWith('--coef=') ? [a.slice(0, a.indexOf('=')), a.slice(a.indexOf('=') + 1)]
      : a.startsWith('--coef=') ? ['--coef', a.slice(7)] : [a, undefined];
    if (flag === '--json') { out.json = true; continue; }
    if (flag === '--coef' || flag === '--from' || flag === '--to') {
      const v = inline ?? args[++i];
      if (v === undefined) return `${flag} needs a value`;
      if (flag === '--coef') {
        const m = /^\s*(\d+)\s*=\s*(-?\d+)\s*$/.exec(v);
        if (!m) return `--coef expects V=N (a vertex number and an integer), got '${v}'`;
        out.coefs.push([Number(m[1]), Number(m[2])]);
      } else {
        const parts = v.split(',');
        if (!parts.every(isInt)) return `${flag} expects vertex numbers separated by commas, got '${v}'`;
        out[flag === '--from' ? 'from' : 'to'] = parts.map(Number);
      }
      continue;
    }
    if (a.startsWith('--')) return `unknown option ${a}`;
    files.push(a);
  }
  if (files.length !== 1) return 'give exactly one diagram file';
  if (out.coefs.length === 0) return 'give at least one --coef V=N';
  out.file = files[0];
  return out;
}

/** Region coefficients from (vertex label, N) pairs, or an error message. O(V + faces) */
function coefficients(d: HeegaardDiagram, a: DiagramAnalysis, coefs: [number, number][]): number[] | string {
  const byLabel = new Map<number, number>();
  for (let v = 0; v < a.vertices; v++) byLabel.set(vertexLabel(d, v), v);
  const onCurve = new Map<number, string>();
  for (const c of d.curves) for (const v of c.vertices) onCurve.set(v, curveName(c));
  const faceOfVertex = new Int32Array(a.vertices).fill(-1);
  for (let h = 0; h < 3 * a.faces; h++) if (faceOfVertex[d.mesh.heVert[h]] < 0) faceOfVertex[d.mesh.heVert[h]] = (h / 3) | 0;
  const coeffs = new Array<number>(a.regions.length).fill(0);
  const setBy = new Map<number, number>();
  for (const [label, n] of coefs) {
    const v = byLabel.get(label);
    if (v === undefined) return `there is no vertex ${label} in the file`;
    if (onCurve.has(v)) return `vertex ${label} lies on ${onCurve.get(v)}; give a vertex inside a region`;
    const r = a.faceRegion[faceOfVertex[v]];
    const prev = setBy.get(r);
    if (prev !== undefined && coeffs[r] !== n) return `vertices ${prev} and ${label} lie in the same region R_${r + 1} but are given different coefficients`;
    coeffs[r] = n;
    setBy.set(r, label);
  }
  return coeffs;
}

/** Point indices from vertex labels, or an error message. */
function pointsOf(a: DiagramAnalysis, labels: number[] | undefined, name: string): number[] | undefined | string {
  if (!labels) return undefined;
  const out: number[] = [];
  for (const l of labels) {
    const i = a.points.findIndex((p) => p.label === l);
    if (i < 0) return `${name}: vertex ${l} is not an intersection point of an alpha and a beta curve`;
    out.push(i);
  }
  return out;
}

/** JSON-ready result with vertex numbers in place of point indices. */
function present(a: DiagramAnalysis, r: DomainCheck, coeffs: number[]) {
  const lab = (pts: number[] | null) => (pts ? pts.map((i) => a.points[i].label) : null);
  return {
    coefficients: coeffs, from: lab(r.from), to: lab(r.to), isDomain: r.isDomain, reason: r.reason,
    eulerMeasure: r.eulerMeasure, geometricEulerMeasure: r.geometricEulerMeasure, nx: r.nx, ny: r.ny,
    nz: Object.fromEntries(a.basepoints.map((b, i) => [`${b.kind}_${b.index + 1}`, r.nz[i]])),
    maslovIndex: r.maslovIndex, positive: r.positive,
    ...(r.undetermined ? { undetermined: { alphas: r.undetermined.alphas.map((i) => `alpha_${i + 1}`), betas: r.undetermined.betas.map((i) => `beta_${i + 1}`) } } : {}),
  };
}

function text(file: string, p: ReturnType<typeof present>): string {
  const show = (v: unknown) => (v === null ? '—' : Array.isArray(v) ? `{${v.join(', ')}}` : String(v));
  return [
    `${file}: domain with region coefficients [${p.coefficients.join(', ')}]`,
    `from: ${show(p.from)}  (vertex numbers)`,
    `to: ${show(p.to)}`,
    `isDomain: ${p.isDomain}`,
    `reason: ${p.reason ?? '—'}`,
    `eulerMeasure: ${p.eulerMeasure}`,
    `geometricEulerMeasure: ${p.geometricEulerMeasure === null ? '—' : p.geometricEulerMeasure.toFixed(9)}`,
    `nx: ${show(p.nx)}`,
    `ny: ${show(p.ny)}`,
    `nz: ${Object.entries(p.nz).map(([k, v]) => `${k} ${v}`).join(', ') || '—'}`,
    `maslovIndex: ${show(p.maslovIndex)}`,
    `positive: ${p.positive}`,
  ].join('\n');
}

function run(args: string[], io: CliIO): number {
  const parsed = parseDomainArgs(args);
  if (typeof parsed === 'string') { io.err(`Usage: quadrant domain ${USAGE}\n${parsed}`); return 2; }
  const d = readDiagramFile(io, 'domain', parsed.file)?.diagram;
  if (!d) return 1;
  const a = analyzeDiagram(d);
  if (!a.ok) { io.err(`quadrant domain: ${parsed.file} is not a valid Heegaard diagram:\n${problemLines(parsed.file, a.errors)}`); return 1; }
  const coeffs = coefficients(d, a.value, parsed.coefs);
  const from = pointsOf(a.value, parsed.from, '--from'), to = pointsOf(a.value, parsed.to, '--to');
  for (const e of [coeffs, from, to]) if (typeof e === 'string') { io.err(`quadrant domain: ${e}`); return 1; }
  const r = checkDomain(toCombinatorial(a.value), coeffs as number[], { from: from as number[] | undefined, to: to as number[] | undefined });
  const p = present(a.value, r, coeffs as number[]);
  io.out(parsed.json ? JSON.stringify(p) : text(parsed.file, p));
  return 0;
}

export const domainCommand: CliCommand = {
  name: 'domain',
  usage: USAGE,
  summary: 'decide whether a 2-chain (coefficients on regions, named by a vertex inside) is a domain from x to y; print e, n_x, n_y, n_z and the Maslov index',
  run,
};
