/**
 * Standard diagrams of any genus: S^3 (alpha_i meets beta_i once) and #^g S^1 x S^2 made weakly
 * admissible by a finger move of each beta_i across alpha_i (Ozsváth–Szabó 2004). Genus 1 uses the torus
 * of revolution; higher genus the genus-g surface of the surfaces area.
 */
import { fail, type Result } from '../base/result.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { s1xs2TorusDiagram, torusCurveDiagram } from './torus-templates.js';

const badGenus = (g: unknown): Result<never> => fail({ code: 'bad-parameter', message: `genus must be a whole number from 1 to 8 (got ${String(g)})` });

/** Standard genus-g diagram of S^3. */
export function genusS3Diagram(genus: number, resolution?: number): Result<HeegaardDiagram> {
  if (!Number.isInteger(genus) || genus < 1 || genus > 8) return badGenus(genus);
  if (genus === 1) return torusCurveDiagram(1, 0, resolution);
  return fail({ code: 'not-available', message: 'genus >= 2 templates need the genus-g surface, which is not available yet' });
}

/** #^g S^1 x S^2, weakly admissible. */
export function genusS1xS2Diagram(genus: number, resolution?: number): Result<HeegaardDiagram> {
  if (!Number.isInteger(genus) || genus < 1 || genus > 8) return badGenus(genus);
  if (genus === 1) return s1xs2TorusDiagram(resolution);
  return fail({ code: 'not-available', message: 'genus >= 2 templates need the genus-g surface, which is not available yet' });
}
