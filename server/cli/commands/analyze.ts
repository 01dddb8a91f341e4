/**
 * `quadrant analyze FILE [--json]`: reads a diagram file (OBJ, OFF, STL through parseDiagramFile),
 * validates it and prints intersection points, regions, Euler measures and curvature. Invalid input:
 * the problems on stderr, exit code 1.
 */
import { formatH1, type FloerSummary } from '../../../geometry/index.js';
import { parseOptions, problemLines, readDiagramFile, type CliCommand, type CliIO } from '../command.js';
import { analysisReport, type AnalysisReport } from '../report.js';

const fmt = (x: number, digits = 6): string =>
  Number.isInteger(x) ? String(x) : Math.abs(x) < 0.5 * 10 ** -digits ? '0' : x.toFixed(digits);
const quarters = (x: number): string => {
  const q = Math.round(4 * x);
  if (q % 4 === 0) return String(q / 4);
  return q % 2 === 0 ? `${q / 2}/2` : `${q}/4`;
};

/** The readable text form of a report. */
export function reportText(file: string, r: AnalysisReport): string {
  const s = r.surface;
  const lines = [
    `${file}`,
    `surface: ${s.vertices} vertices, ${s.faces} triangles, Euler characteristic ${s.eulerCharacteristic}, genus ${s.genus}, total curvature / 2π = ${fmt(s.totalCurvature, 9)}`,
    `curves: ${r.alpha} alpha, ${r.beta} beta; basepoints: ${r.basepoints.map((b) => `${b.name} at vertex ${b.vertex} (R_${b.region})`).join(', ') || 'none'}`,
    '',
    `intersection points (${r.intersections.length}):`,
    ...r.intersections.map((p) => `  x_${p.id}  vertex ${p.vertex}  alpha_${p.alpha} ∩ beta_${p.beta}  sign ${p.sign > 0 ? '+1' : '-1'}  quadrants NE R_${p.quadrants[0]}, NW R_${p.quadrants[1]}, SW R_${p.quadrants[2]}, SE R_${p.quadrants[3]}`),
    '',
    `regions (${r.regions.length}):`,
    ...r.regions.map((g) => {
      const curv = `curvature/2π interior ${fmt(g.curvature.interior)}, boundary ${fmt(g.curvature.boundary)}, corners ${fmt(g.curvature.corners)}`;
      const bps = g.basepoints.length ? `  contains ${g.basepoints.join(', ')}` : '';
      return `  R_${g.id}  ${g.faces} triangles  χ ${g.eulerCharacteristic}  corners ${g.convexCorners} convex, ${g.reflexCorners} reflex  e = ${quarters(g.eulerMeasure)} (Gauss–Bonnet ${fmt(g.geometricEulerMeasure, 9)}; ${curv})${bps}`;
    }),
    '',
    `sum of Euler measures: ${quarters(r.eulerMeasureTotal)} (χ(Σ) = ${s.eulerCharacteristic})`,
  ];
  lines.push('', ...floerText(r as unknown as Partial<FloerSummary>));
  if (r.defects.length) lines.push('', 'defects (please report):', ...r.defects.map((d) => `  ${d}`));
  return lines.join('\n');
}

const yesNo = (b: boolean | null | undefined): string => (b === null || b === undefined ? 'undecided' : b ? 'yes' : 'no');
const regionList = (coefficients: readonly number[]): string =>
  coefficients.map((c, i) => (c ? `${c}·R_${i + 1}` : '')).filter(Boolean).join(' + ');

/** The Floer fields of the report (generators, H_1, admissibility, niceness, HF-hat) as text lines. */
function floerText(f: Partial<FloerSummary>): string[] {
  if (!f.h1) return [];
  const lines = [
    `generators: ${f.generators ?? 'too many to count'}`,
    `H_1(Y) = ${formatH1(f.h1)}`,
    `periodic domains: ${f.periodicDomains ?? 0}; weakly admissible: ${yesNo(f.weaklyAdmissible)}` +
      (f.offendingPeriodicDomain ? ` (non-negative periodic domain ${regionList(f.offendingPeriodicDomain)})` : ''),
    ...(f.signedCount ? [`signed count of generators: ${f.signedCount.value} (det M = ${f.signedCount.determinant}` +
      `${f.signedCount.h1Order ? `, ±|H_1| = ±${f.signedCount.h1Order}` : ''}) — ${f.signedCount.agrees ? 'agrees' : 'DOES NOT AGREE (please report)'}`] : []),
    `nice: ${yesNo(f.nice)}` +
      (f.notNiceRegions?.length ? ` (not bigons or squares: ${f.notNiceRegions.map((r) => `R_${r.region}`).join(', ')})` : ''),
  ];
  if (!f.hfHat) {
    lines.push(`HF-hat: not computed — ${f.hfHatReason ?? 'unavailable'}`);
    return lines;
  }
  lines.push(`HF-hat: rank ${f.hfHat.rank}` + (f.hfHat.rawRank !== f.hfHat.rank ? ` (the multi-pointed complex has rank ${f.hfHat.rawRank})` : ''));
  for (const c of f.hfHat.bySpinc) {
    const grades = c.byGrading.filter((g) => g.rawRank > 0).map((g) => `${g.rawRank} in grading ${g.grading}`).join(', ');
    lines.push(`  spin^c ${c.label}: ${c.generators} generator${c.generators === 1 ? "" : "s"}, rank ${c.rank ?? c.rawRank}${grades ? ` (${grades})` : ''}`);
  }
  return lines;
}

async function run(args: string[], io: CliIO): Promise<number> {
  const { flags, positional } = parseOptions(args);
  const unknown = [...flags.keys()].filter((f) => f !== 'json');
  if (positional.length !== 1 || unknown.length) {
    io.err(`Usage: quadrant analyze FILE [--json]${unknown.length ? `\nunknown option --${unknown[0]}` : ''}`);
    return 2;
  }
  const file = positional[0];
  const parsed = readDiagramFile(io, 'analyze', file);
  if (!parsed) return 1;
  const report = analysisReport(parsed.diagram);
  if (!report.ok) {
    io.err(`quadrant analyze: ${file} is not a valid Heegaard diagram:\n${problemLines(file, report.errors)}`);
    return 1;
  }
  io.out(flags.has('json') ? JSON.stringify(report.value) : reportText(file, report.value));
  return 0;
}

export const analyzeCommand: CliCommand = {
  name: 'analyze',
  usage: 'FILE [--json]',
  summary: 'check a diagram file and list its intersection points, regions, Euler measures and curvature',
  run,
};
