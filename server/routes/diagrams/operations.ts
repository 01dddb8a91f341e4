/**
 * Applies an API edit operation to a diagram through the geometry core. Every operation returns a new
 * diagram (the input is untouched) or the geometry's problems in words.
 */
import {
  addBasepoint, deleteCurve, dehnTwist, drawCurve, fingerMove, moveBasepoint, nearestCorner, removeBasepoint,
  removeBigon, renameCurve, shortestPath, smoothCurves, subdivideDiagram, taubinSmooth, fail, ok,
  type HeegaardDiagram, type Result,
} from '../../../geometry/index.js';
import type { BasepointRef, CurveRef, EditOperation, SurfacePoint } from '../../contract/diagrams.js';

const refName = (r: { family: string; index: number }) => `${r.family}_${r.index + 1}`;

function curvePos(d: HeegaardDiagram, ref: CurveRef): number | string {
  const i = d.curves.findIndex((c) => c.family === ref.family && c.index === ref.index);
  return i >= 0 ? i : `${refName(ref)} does not exist in this revision`;
}

function basepointPos(d: HeegaardDiagram, ref: BasepointRef): number | string {
  const i = d.basepoints.findIndex((b) => b.kind === ref.kind && b.index === ref.index);
  return i >= 0 ? i : `${ref.kind}_${ref.index + 1} does not exist in this revision`;
}

function onSurface(d: HeegaardDiagram, p: SurfacePoint): string | null {
  return Number.isInteger(p.face) && p.face >= 0 && p.face < d.mesh.nF ? null : `face ${p.face} is not on this revision's surface (it has ${d.mesh.nF} faces)`;
}

const refuse = (message: string): Result<HeegaardDiagram> => fail({ code: 'bad-operation', message });

/** Vertex path for a finger move: picked points snapped to vertices, joined by shortest edge paths. */
function fingerPath(d: HeegaardDiagram, points: SurfacePoint[]): number[] | string {
  const verts = points.map((p) => nearestCorner(d.mesh, p));
  const path: number[] = [verts[0]];
  for (let i = 1; i < verts.length; i++) {
    if (verts[i] === path[path.length - 1]) continue;
    const seg = shortestPath(d.mesh, path[path.length - 1], verts[i]);
    if (!seg) return 'the picked points are not connected on the surface';
    path.push(...seg.slice(1));
  }
  return path.length >= 2 ? path : 'pick a path of at least two distinct points';
}

/** Applies one edit operation. */
export function applyOperation(d: HeegaardDiagram, op: EditOperation): Result<HeegaardDiagram> {
  switch (op.type) {
    case 'twist': {
      const c = curvePos(d, op.curve), a = curvePos(d, op.along);
      if (typeof c === 'string') return refuse(c);
      if (typeof a === 'string') return refuse(a);
      return dehnTwist(d, c, a, { negative: op.negative });
    }
    case 'subdivide':
      return subdivideDiagram(d, op.method);
    case 'draw-curve': {
      if (!op.closed) return refuse('attaching curves are closed: finish the curve where it started');
      const bad = op.points.map((p) => onSurface(d, p)).find((x) => x);
      return bad ? refuse(bad) : drawCurve(d, op.family, op.points);
    }
    case 'finger-move': {
      const c = curvePos(d, op.curve);
      if (typeof c === 'string') return refuse(c);
      const bad = op.path.map((p) => onSurface(d, p)).find((x) => x);
      if (bad) return refuse(bad);
      const path = fingerPath(d, op.path);
      return typeof path === 'string' ? refuse(path) : fingerMove(d, c, path);
    }
    case 'delete-curve': {
      const c = curvePos(d, op.curve);
      return typeof c === 'string' ? refuse(c) : deleteCurve(d, c);
    }
    case 'rename-curve': {
      const c = curvePos(d, op.curve);
      return typeof c === 'string' ? refuse(c) : renameCurve(d, c, op.family ?? op.curve.family, op.index);
    }
    case 'add-basepoint': {
      const bad = onSurface(d, op.at);
      return bad ? refuse(bad) : addBasepoint(d, op.kind, op.at);
    }
    case 'move-basepoint': {
      const b = basepointPos(d, op.basepoint);
      if (typeof b === 'string') return refuse(b);
      const bad = onSurface(d, op.at);
      return bad ? refuse(bad) : moveBasepoint(d, b, op.at);
    }
    case 'remove-basepoint': {
      const b = basepointPos(d, op.basepoint);
      return typeof b === 'string' ? refuse(b) : removeBasepoint(d, b);
    }
    case 'smooth':
      return ok({ ...d, mesh: taubinSmooth(d.mesh, op.iterations) });
    case 'smooth-curves':
      return smoothCurves(d, { iterations: op.iterations });
    case 'remove-bigon':
      return removeBigon(d, op.region);
  }
}

/** A one-line history message for an operation. */
export function describeOperation(op: EditOperation): string {
  switch (op.type) {
    case 'twist': return `Dehn twist of ${refName(op.curve)} along ${refName(op.along)}${op.negative ? ' (negative)' : ''}`;
    case 'subdivide': return `${op.method === 'loop' ? 'Loop' : 'Midpoint'} subdivision`;
    case 'draw-curve': return `Drew a new ${op.family} curve`;
    case 'finger-move': return `Finger move of ${refName(op.curve)}`;
    case 'delete-curve': return `Deleted ${refName(op.curve)}`;
    case 'rename-curve': return `Renamed ${refName(op.curve)} to ${refName({ family: op.family ?? op.curve.family, index: op.index })}`;
    case 'add-basepoint': return `Added a ${op.kind} basepoint`;
    case 'move-basepoint': return `Moved ${op.basepoint.kind}_${op.basepoint.index + 1}`;
    case 'remove-basepoint': return `Removed ${op.basepoint.kind}_${op.basepoint.index + 1}`;
    case 'smooth': return `Smoothed the surface (${op.iterations} passes)`;
    case 'smooth-curves': return `Smoothed the curves (${op.iterations} passes)`;
    case 'remove-bigon': return `Removed the empty bigon R_${op.region + 1}`;
  }
}
