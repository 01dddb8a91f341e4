/**
 * Standard diagrams of any genus: S^3 (alpha_i meets beta_i once) and #^g S^1 x S^2 made weakly
 * admissible by a finger move of each beta_i across alpha_i (Ozsváth–Szabó 2004). Genus 1 uses the torus
 * of revolution; higher genus the genus-g surface (voxel-slab cage smoothed by Catmull–Clark).
 */
import { fail, type Result } from '../base/result.js';
import { buildTriMesh, next } from '../mesh/tri-mesh.js';
import { genusSurface } from '../surfaces/genus.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { s1xs2TorusDiagram, torusCurveDiagram } from './torus-templates.js';
import { checkDiagram, closeDiagram, fan, workspaceFrom } from './labels.js';
import { leftSpokes, parallelCopyLeft } from './parallel.js';
import { fingerMoveInPlace } from './finger.js';
import { onCurve } from './paths.js';

const badGenus = (g: unknown): Result<never> => fail({ code: 'bad-parameter', message: `genus must be a whole number from 1 to 8 (got ${String(g)})` });
const badLevel = (l: unknown): Result<never> => fail({ code: 'bad-parameter', message: `resolution (smoothing level) must be a whole number from 1 to 4 for genus >= 2 (got ${String(l)})` });
const defaultLevel = (g: number) => (g <= 3 ? 3 : 2);

/** Standard genus-g diagram of S^3: alpha_i meets beta_i once, alpha_i and beta_j disjoint for i != j. */
export function genusS3Diagram(genus: number, resolution?: number): Result<HeegaardDiagram> {
  if (!Number.isInteger(genus) || genus < 1 || genus > 8) return badGenus(genus);
  if (genus === 1) return torusCurveDiagram(1, 0, resolution);
  const level = resolution ?? defaultLevel(genus);
  if (!Number.isInteger(level) || level < 1 || level > 4) return badLevel(resolution);
  const s = genusSurface({ genus, level });
  return checkDiagram({
    mesh: buildTriMesh(s.pos, s.tris).mesh,
    curves: [...s.alphas.map((v, i) => ({ family: 'alpha' as const, index: i, vertices: v })), ...s.betas.map((v, i) => ({ family: 'beta' as const, index: i, vertices: v }))],
    basepoints: [{ kind: 'z', index: 0, vertex: s.basepoint }],
  });
}

/**
 * #^g S^1 x S^2, weakly admissible: beta_i is a parallel copy of alpha_i on its left, pushed by a finger
 * across alpha_i, so they meet twice and bound two bigons (Ozsváth–Szabó 2004: the disjoint diagram is
 * not admissible).
 */
export function genusS1xS2Diagram(genus: number, resolution?: number): Result<HeegaardDiagram> {
  if (!Number.isInteger(genus) || genus < 1 || genus > 8) return badGenus(genus);
  if (genus === 1) return s1xs2TorusDiagram(resolution);
  const level = resolution ?? defaultLevel(genus);
  if (!Number.isInteger(level) || level < 1 || level > 4) return badLevel(resolution);
  const s = genusSurface({ genus, level });
  const ws0 = workspaceFrom(buildTriMesh(s.pos, s.tris).mesh, s.alphas.map((v, i) => ({ family: 'alpha' as const, index: i, vertices: v })), [{ kind: 'z', index: 0, vertex: s.basepoint }]);
  if (!ws0.ok) return ws0;
  const ws = ws0.value, em = ws.em;
  for (let i = 0; i < genus; i++) {
    const alpha = Array.from(s.alphas[i]);
    const label = genus + i + 1;
    const copy = parallelCopyLeft(em, alpha, 0.5, label);
    ws.curves.push({ family: 'beta', index: i, start: copy[0] });
    // Finger: from a copy vertex to its alpha vertex, then across to a free vertex on the right.
    const j = Math.floor(alpha.length / 2);
    const rev = alpha.slice().reverse();
    const right = leftSpokes(em, rev, alpha.length - 1 - j).filter((w) => !onCurve(em, w) && w !== s.basepoint);
    const start = fan(em, alpha[j]).map((h) => em.heVert[next(h)]).find((w) => copy.includes(w));
    if (start === undefined || right.length === 0) return fail({ code: 'internal-template', message: `no room for the finger move of beta_${i + 1}; this is a bug in Quadrant` });
    const why = fingerMoveInPlace(ws, label, [start, alpha[j], right[Math.floor(right.length / 2)]]);
    if (why) return fail(why);
  }
  return closeDiagram(ws);
}
