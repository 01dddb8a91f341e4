/**
 * One entry point for every built-in diagram. Each result is a new, fully validated diagram; bad
 * parameters give a Result with a sentence naming the parameter.
 */
import { fail, type Result } from '../base/result.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { gridDiagram, lensDiagram, s1xs2TorusDiagram, torusCurveDiagram } from './torus-templates.js';
import { genusS1xS2Diagram, genusS3Diagram } from './genus-templates.js';

/**
 * What to build. `resolution` refines the mesh; defaults look smooth:
 * - lens, torus-curve, s3/s1xs2 of genus 1: grid steps around the torus in the shorter direction, 8..512 (32);
 * - grid: grid steps per cell, even, 2..32 (4);
 * - s3, s1xs2 of genus >= 2: Catmull–Clark smoothing level 1..4 (3 up to genus 3, else 2).
 */
export type TemplateSpec =
  | { kind: 'lens'; p: number; q: number; resolution?: number }
  | { kind: 'torus-curve'; p: number; q: number; resolution?: number }
  | { kind: 'grid'; x: number[]; o: number[]; resolution?: number }
  | { kind: 's3'; genus: number; resolution?: number }
  | { kind: 's1xs2'; genus: number; resolution?: number };

/**
 * Builds a template diagram:
 * - lens: L(p, q) on a torus of revolution, alpha the meridian, beta a (p, q) curve (1 <= q < p <= 50).
 * - torus-curve: alpha the meridian, beta the (p, q) curve (gcd 1, p >= 0).
 * - grid: n x n grid diagram from X and O column permutations (0-based rows), X = z, O = w basepoints;
 *   resolution = grid steps per cell (even).
 * - s3: standard genus-g diagram of S^3 (alpha_i meets beta_i once), g = 1..8.
 * - s1xs2: #^g S^1 x S^2, beta_i a finger-moved parallel copy of alpha_i (two bigons each: weakly admissible).
 */
export function buildTemplate(spec: TemplateSpec): Result<HeegaardDiagram> {
  if (!spec || typeof spec !== 'object') return fail({ code: 'bad-template', message: 'the template specification is missing' });
  switch (spec.kind) {
    case 'lens': return lensDiagram(spec.p, spec.q, spec.resolution);
    case 'torus-curve': return torusCurveDiagram(spec.p, spec.q, spec.resolution);
    case 'grid': return gridDiagram(spec.x, spec.o, spec.resolution);
    case 's3': return genusS3Diagram(spec.genus, spec.resolution);
    case 's1xs2': return genusS1xS2Diagram(spec.genus, spec.resolution);
    default: return fail({ code: 'bad-template', message: `unknown template kind '${String((spec as { kind?: unknown }).kind)}'; use lens, torus-curve, grid, s3 or s1xs2` });
  }
}
