/**
 * Applies an API edit operation to a diagram through the geometry core. Every operation returns a new
 * diagram (the input is untouched) or the geometry's problems in words.
 */
import {
  addBasepoint, buildTriMesh, deleteCurve, dehnTwist, drawCurve, fingerMove, moveBasepoint, nearestCorner,
  removeBasepoint, renameCurve, shortestPath, subdivideDiagram, fail, ok,
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

/**
 * Taubin λ|μ smoothing (Taubin 1995, "A signal processing approach to fair surface design"): alternating
 * uniform Laplacian steps with λ = 0.5 and μ = −0.53 keep the volume from shrinking. Topology, curves and
 * basepoints unchanged. O(iterations · F).
 */
function smooth(d: HeegaardDiagram, iterations: number): Result<HeegaardDiagram> {
  const m = d.mesh, nV = m.nV, nF = m.nF;
  let pos = Float64Array.from(m.pos.subarray(0, 3 * nV));
  const sum = new Float64Array(3 * nV), deg = new Float64Array(nV);
  const step = (factor: number) => {
    sum.fill(0);
    deg.fill(0);
    for (let h = 0; h < 3 * nF; h++) {
      const a = m.heVert[h], b = m.heVert[h % 3 === 2 ? h - 2 : h + 1];
      for (let k = 0; k < 3; k++) sum[3 * a + k] += pos[3 * b + k];
      deg[a]++;
    }
    const out = new Float64Array(3 * nV);
    for (let v = 0; v < nV; v++) {
      for (let k = 0; k < 3; k++) {
        const p = pos[3 * v + k];
        out[3 * v + k] = deg[v] > 0 ? p + factor * (sum[3 * v + k] / deg[v] - p) : p;
      }
    }
    pos = out;
  };
  for (let i = 0; i < iterations; i++) {
    step(0.5);
    step(-0.53);
  }
  const { mesh } = buildTriMesh(pos, m.heVert.subarray(0, 3 * nF));
  return ok({ ...d, mesh });
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
      return smooth(d, op.iterations);
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
  }
}
