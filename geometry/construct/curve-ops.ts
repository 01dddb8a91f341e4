/**
 * Bookkeeping edits: delete or rename a curve, add / move / remove a basepoint. These may leave a diagram
 * that is still being built (unequal curve counts, basepoints not yet one per piece), so they use partial
 * validation; everything else (connectivity, curve invariants, basepoints off curves) is checked in full.
 */
import { fail, type Result } from '../base/result.js';
import { splitFace } from '../mesh/edit.js';
import { curveName, type BasepointKind, type CurveFamily, type HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, isIndex, openDiagram, wsLabel } from './labels.js';
import { onCurve } from './paths.js';
import type { SurfacePoint } from './draw.js';

const badCurve = (d: HeegaardDiagram, c: number): Result<never> => fail({ code: 'unknown-curve', message: `there is no curve at position ${c}; the diagram has ${d.curves.length}` });

/** Removes curve number `curve`; later curves of its family move down one index. */
export function deleteCurve(d: HeegaardDiagram, curve: number): Result<HeegaardDiagram> {
  if (!isIndex(curve, d.curves.length)) return badCurve(d, curve);
  const gone = d.curves[curve];
  const curves = d.curves.filter((_, i) => i !== curve).map((c) => ({
    ...c, index: c.family === gone.family && c.index > gone.index ? c.index - 1 : c.index,
  }));
  const ws = openDiagram({ ...d, curves });
  return ws.ok ? closeDiagram(ws.value, { partial: true }) : ws;
}

/** Gives curve number `curve` a new family and index; refuses a name already in use. */
export function renameCurve(d: HeegaardDiagram, curve: number, family: CurveFamily, index: number): Result<HeegaardDiagram> {
  if (!isIndex(curve, d.curves.length)) return badCurve(d, curve);
  if ((family !== 'alpha' && family !== 'beta') || !Number.isInteger(index) || index < 0) {
    return fail({ code: 'bad-name', message: 'a curve name is alpha or beta with a number from 1' });
  }
  const clash = d.curves.findIndex((c, i) => i !== curve && c.family === family && c.index === index);
  if (clash >= 0) return fail({ code: 'name-in-use', message: `${curveName({ family, index })} already exists` });
  const curves = d.curves.map((c, i) => (i === curve ? { ...c, family, index } : c));
  const ws = openDiagram({ ...d, curves });
  return ws.ok ? closeDiagram(ws.value, { partial: true }) : ws;
}

/** Where a basepoint goes: an existing vertex, or a surface point (its face is split there). */
export type BasepointPlace = number | SurfacePoint;

/** Puts a basepoint of `kind` (next free index) at a vertex or surface point off the curves. */
export function addBasepoint(d: HeegaardDiagram, kind: BasepointKind, place: BasepointPlace): Result<HeegaardDiagram> {
  const index = d.basepoints.filter((b) => b.kind === kind).length;
  return placeBasepoint(d, -1, kind, index, place);
}

/** Moves basepoint number `which` (position in d.basepoints) to a vertex or surface point off the curves. */
export function moveBasepoint(d: HeegaardDiagram, which: number, place: BasepointPlace): Result<HeegaardDiagram> {
  if (!isIndex(which, d.basepoints.length)) return fail({ code: 'unknown-basepoint', message: `there is no basepoint at position ${which}` });
  return placeBasepoint(d, which, d.basepoints[which].kind, d.basepoints[which].index, place);
}

/** Removes basepoint number `which`; later basepoints of its kind move down one index. */
export function removeBasepoint(d: HeegaardDiagram, which: number): Result<HeegaardDiagram> {
  if (!isIndex(which, d.basepoints.length)) return fail({ code: 'unknown-basepoint', message: `there is no basepoint at position ${which}` });
  const gone = d.basepoints[which];
  const basepoints = d.basepoints.filter((_, i) => i !== which).map((b) => ({ ...b, index: b.kind === gone.kind && b.index > gone.index ? b.index - 1 : b.index }));
  const ws = openDiagram({ ...d, basepoints });
  return ws.ok ? closeDiagram(ws.value, { partial: true }) : ws;
}

function placeBasepoint(d: HeegaardDiagram, which: number, kind: BasepointKind, index: number, place: BasepointPlace): Result<HeegaardDiagram> {
  if (kind !== 'z' && kind !== 'w') return fail({ code: 'bad-kind', message: 'a basepoint is of kind z or w' });
  const ws0 = openDiagram(d);
  if (!ws0.ok) return ws0;
  const ws = ws0.value, em = ws.em;
  let v: number;
  if (typeof place === 'number') {
    if (!(Number.isInteger(place) && place >= 0 && place < em.nV)) return fail({ code: 'bad-vertex', message: `vertex ${place + 1} is not on the surface` });
    v = place;
  } else {
    const b = place?.bary;
    if (!(place && Number.isInteger(place.face) && place.face >= 0 && place.face < em.nF && Array.isArray(b) && b.length === 3 && b.every((x) => Number.isFinite(x) && x > 0))) {
      return fail({ code: 'bad-point', message: 'the point must be inside a face of the surface (three positive barycentric weights)' });
    }
    v = splitFace(em, place.face, b[0], b[1], b[2]);
  }
  if (onCurve(em, v)) return fail({ code: 'basepoint-on-curve', message: `vertex ${wsLabel(ws, v)} lies on a curve; basepoints must lie off the curves`, vertices: [wsLabel(ws, v)] });
  const other = ws.basepoints.findIndex((b, i) => i !== which && b.vertex === v);
  if (other >= 0) return fail({ code: 'basepoint-taken', message: `vertex ${wsLabel(ws, v)} already holds basepoint ${ws.basepoints[other].kind}_${ws.basepoints[other].index + 1}`, vertices: [wsLabel(ws, v)] });
  if (which >= 0) ws.basepoints[which] = { kind, index, vertex: v };
  else ws.basepoints.push({ kind, index, vertex: v });
  return closeDiagram(ws, { partial: true });
}
