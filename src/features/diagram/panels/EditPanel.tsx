import { useState } from 'react';
import type { BasepointRef, CurveRef, EditOperationInput, SurfacePoint } from '../../../../server/contract/index.js';
import type { Vec3 } from '../../../viewer/types';
import { Button, SelectField } from '../../../lib/ui';
import { curveLabel, regionLabel } from '../format';

/** Points picked on the surface for a new curve, a finger move, or where a basepoint goes. */
export interface DrawState {
  purpose: 'curve' | 'finger' | 'basepoint';
  family: 'alpha' | 'beta';
  /** For a finger move: the curve pushed along the path. */
  curve: CurveRef | null;
  /** For placing a basepoint: the one moved (null adds a new basepoint of `kind`). */
  basepoint?: BasepointRef | null;
  kind?: 'z' | 'w';
  points: SurfacePoint[];
  world: Vec3[];
}

export interface EditPanelProps {
  curves: CurveRef[];
  basepoints: BasepointRef[];
  /** Region ids of the bigons holding no basepoint (candidates for isotopy clean-up). */
  emptyBigons: number[];
  isHead: boolean;
  busy: boolean;
  draw: DrawState | null;
  onDraw: (d: DrawState | null) => void;
  onApply: (op: EditOperationInput, message: string) => void;
}

const refKey = (c: CurveRef) => `${c.family}:${c.index}`;
const parseRef = (k: string): CurveRef => { const [family, index] = k.split(':'); return { family: family as 'alpha' | 'beta', index: Number(index) }; };
const labelOf = (k: string) => { const r = parseRef(k); return curveLabel(r.family, r.index); };
const SUBSCRIPT = '₀₁₂₃₄₅₆₇₈₉';
const basepointLabel = (b: BasepointRef) => `${b.kind}${String(b.index + 1).replace(/\d/g, (c) => SUBSCRIPT[Number(c)])}`;
const basepointKey = (b: BasepointRef) => `${b.kind}:${b.index}`;

/** What the picked points are for, in words. */
function drawTitle(draw: DrawState): string {
  if (draw.purpose === 'curve') return `Drawing a new ${draw.family === 'alpha' ? 'α' : 'β'} curve`;
  if (draw.purpose === 'finger') return `Finger move of ${draw.curve ? curveLabel(draw.curve.family, draw.curve.index) : ''}`;
  return draw.basepoint ? `Moving ${basepointLabel(draw.basepoint)}` : `Placing a new ${draw.kind ?? 'z'} basepoint`;
}

/** The edit a finished pick makes, with its history message; null when not enough points are picked. */
function finishedEdit(draw: DrawState): [EditOperationInput, string] | null {
  const last = draw.points[draw.points.length - 1];
  if (draw.purpose === 'curve') return draw.points.length >= 3 ? [{ type: 'draw-curve', family: draw.family, points: draw.points, closed: true }, `Drew a ${draw.family} curve`] : null;
  if (draw.purpose === 'finger') return draw.curve && draw.points.length >= 2 ? [{ type: 'finger-move', curve: draw.curve, path: draw.points }, `Finger move of ${curveLabel(draw.curve.family, draw.curve.index)}`] : null;
  if (!last) return null;
  return draw.basepoint
    ? [{ type: 'move-basepoint', basepoint: draw.basepoint, at: last }, `Moved ${basepointLabel(draw.basepoint)}`]
    : [{ type: 'add-basepoint', kind: draw.kind ?? 'z', at: last }, `Placed a ${draw.kind ?? 'z'} basepoint`];
}

/** Drawing curves and the server's operations; each applied change becomes a new revision. */
export function EditPanel({ curves, basepoints, emptyBigons, isHead, busy, draw, onDraw, onApply }: EditPanelProps) {
  const options = curves.map((c) => ({ value: refKey(c), label: curveLabel(c.family, c.index) }));
  const [family, setFamily] = useState<'alpha' | 'beta'>('alpha');
  const [twistCurve, setTwistCurve] = useState(options.find((o) => o.value.startsWith('beta'))?.value ?? options[0]?.value ?? '');
  const [twistAlong, setTwistAlong] = useState(options.find((o) => o.value.startsWith('alpha'))?.value ?? options[0]?.value ?? '');
  const [negative, setNegative] = useState(false);
  const [fingerCurve, setFingerCurve] = useState(options.find((o) => o.value.startsWith('beta'))?.value ?? options[0]?.value ?? '');
  const [curveToChange, setCurveToChange] = useState(options[0]?.value ?? '');
  const [newNumber, setNewNumber] = useState('1');
  const [kind, setKind] = useState<'z' | 'w'>('z');
  const bpOptions = basepoints.map((b) => ({ value: basepointKey(b), label: basepointLabel(b) }));
  const [bpToChange, setBpToChange] = useState(bpOptions[0]?.value ?? '');
  const bpRef = (k: string): BasepointRef => { const [kd, i] = k.split(':'); return { kind: kd as 'z' | 'w', index: Number(i) }; };
  const finished = draw ? finishedEdit(draw) : null;
  const [bigonChoice, setBigon] = useState('');
  const bigon = bigonChoice !== '' && emptyBigons.includes(Number(bigonChoice)) ? bigonChoice : String(emptyBigons[0] ?? '');

  if (!isHead) {
    return <p className="text-sm text-ink-muted">You are viewing an older revision. Edits apply to the latest revision; restore this one from History to continue from it.</p>;
  }
  const drawing = draw !== null;
  return (
    <div className="flex flex-col gap-5 text-sm">
      <section aria-labelledby="draw-title" className="flex flex-col gap-2">
        <h3 id="draw-title" className="font-semibold">Draw a curve</h3>
        {!drawing ? (
          <div className="flex items-end gap-2">
            <SelectField label="Family" value={family} onChange={(e) => setFamily(e.target.value as 'alpha' | 'beta')}
              options={[{ value: 'alpha', label: 'α (alpha)' }, { value: 'beta', label: 'β (beta)' }]} />
            <Button onClick={() => onDraw({ purpose: 'curve', family, curve: null, points: [], world: [] })} disabled={busy}>Start drawing</Button>
          </div>
        ) : (
          <div className="flex flex-col gap-2 rounded-md border border-accent/40 bg-accent-soft p-3">
            <p role="status" aria-live="polite">
              {drawTitle(draw)}:{' '}{draw.points.length} point{draw.points.length === 1 ? '' : 's'} picked.{' '}
              {draw.purpose === 'curve' ? 'Click on the surface to add points; the curve closes back to the first point.'
                : draw.purpose === 'finger' ? 'Click on the surface to add points, starting next to the curve.'
                  : 'Click the place on the surface, away from the curves; the last click counts.'}
            </p>
            <div className="flex flex-wrap gap-2">
              <Button size="sm" variant="secondary" disabled={draw.points.length === 0} onClick={() => onDraw({ ...draw, points: draw.points.slice(0, -1), world: draw.world.slice(0, -1) })}>Undo last point</Button>
              <Button size="sm" variant="ghost" onClick={() => onDraw(null)}>Cancel</Button>
              <Button size="sm" disabled={!finished || busy} loading={busy} onClick={() => finished && onApply(...finished)}>
                Finish
              </Button>
            </div>
          </div>
        )}
      </section>

      {options.length >= 2 && (
        <section aria-labelledby="twist-title" className="flex flex-col gap-2">
          <h3 id="twist-title" className="font-semibold">Dehn twist</h3>
          <div className="grid grid-cols-2 gap-2">
            <SelectField label="Twist the curve" value={twistCurve} onChange={(e) => setTwistCurve(e.target.value)} options={options} />
            <SelectField label="Along" value={twistAlong} onChange={(e) => setTwistAlong(e.target.value)} options={options} error={twistCurve === twistAlong ? 'Choose two different curves.' : null} />
          </div>
          <label className="flex items-center gap-2"><input type="checkbox" checked={negative} onChange={(e) => setNegative(e.target.checked)} /> Left-handed (negative) twist</label>
          <div>
            <Button variant="secondary" disabled={busy || drawing || twistCurve === twistAlong}
              onClick={() => onApply({ type: 'twist', curve: parseRef(twistCurve), along: parseRef(twistAlong), negative }, `Dehn twist of ${labelOf(twistCurve)} along ${labelOf(twistAlong)}${negative ? ' (negative)' : ''}`)}>
              Apply the twist
            </Button>
          </div>
        </section>
      )}

      <section aria-labelledby="finger-title" className="flex flex-col gap-2">
        <h3 id="finger-title" className="font-semibold">Finger move</h3>
        <div className="flex items-end gap-2">
          <SelectField label="Push the curve" value={fingerCurve} onChange={(e) => setFingerCurve(e.target.value)} options={options} />
          <Button variant="secondary" disabled={busy || drawing || !fingerCurve}
            onClick={() => onDraw({ purpose: 'finger', family: parseRef(fingerCurve).family, curve: parseRef(fingerCurve), points: [], world: [] })}>
            Pick its path
          </Button>
        </div>
      </section>

      <section aria-labelledby="curves-title" className="flex flex-col gap-2">
        <h3 id="curves-title" className="font-semibold">Curves and basepoints</h3>
        {options.length > 0 && (
          <div className="flex flex-wrap items-end gap-2">
            <SelectField label="Curve" value={curveToChange} onChange={(e) => setCurveToChange(e.target.value)} options={options} />
            <Button variant="danger" size="sm" disabled={busy || drawing || !curveToChange}
              onClick={() => onApply({ type: 'delete-curve', curve: parseRef(curveToChange) }, `Deleted ${labelOf(curveToChange)}`)}>
              Delete the curve
            </Button>
            <label className="flex flex-col gap-1">
              <span className="text-ink-muted">New number</span>
              <input type="number" min={1} value={newNumber} onChange={(e) => setNewNumber(e.target.value)} className="h-8 w-20 rounded-md border border-line-strong px-2" />
            </label>
            <Button variant="secondary" size="sm" disabled={busy || drawing || !curveToChange || !(Number(newNumber) >= 1)}
              onClick={() => { const c = parseRef(curveToChange); onApply({ type: 'rename-curve', curve: c, index: Number(newNumber) - 1 }, `Renumbered ${labelOf(curveToChange)} as ${curveLabel(c.family, Number(newNumber) - 1)}`); }}>
              Renumber
            </Button>
          </div>
        )}
        <div className="flex flex-wrap items-end gap-2">
          <SelectField label="Basepoint kind" value={kind} onChange={(e) => setKind(e.target.value as 'z' | 'w')}
            options={[{ value: 'z', label: 'z (avoided by HF-hat)' }, { value: 'w', label: 'w (second set)' }]} />
          <Button variant="secondary" size="sm" disabled={busy || drawing}
            onClick={() => onDraw({ purpose: 'basepoint', family: 'alpha', curve: null, basepoint: null, kind, points: [], world: [] })}>
            Place a basepoint
          </Button>
        </div>
        {bpOptions.length > 0 && (
          <div className="flex flex-wrap items-end gap-2">
            <SelectField label="Basepoint" value={bpToChange} onChange={(e) => setBpToChange(e.target.value)} options={bpOptions} />
            <Button variant="secondary" size="sm" disabled={busy || drawing || !bpToChange}
              onClick={() => onDraw({ purpose: 'basepoint', family: 'alpha', curve: null, basepoint: bpRef(bpToChange), points: [], world: [] })}>
              Move it
            </Button>
            <Button variant="danger" size="sm" disabled={busy || drawing || !bpToChange}
              onClick={() => onApply({ type: 'remove-basepoint', basepoint: bpRef(bpToChange) }, `Removed ${basepointLabel(bpRef(bpToChange))}`)}>
              Remove it
            </Button>
          </div>
        )}
      </section>

      {emptyBigons.length > 0 && (
        <section aria-labelledby="bigon-title" className="flex flex-col gap-2">
          <h3 id="bigon-title" className="font-semibold">Isotopy clean-up</h3>
          <div className="flex items-end gap-2">
            <SelectField label="Empty bigon" value={bigon} onChange={(e) => setBigon(e.target.value)}
              options={emptyBigons.map((r) => ({ value: String(r), label: regionLabel(r) }))} />
            <Button variant="secondary" size="sm" disabled={busy || drawing || bigon === ''}
              onClick={() => onApply({ type: 'remove-bigon', region: Number(bigon) }, `Removed the empty bigon ${regionLabel(Number(bigon))}`)}>
              Remove the bigon
            </Button>
          </div>
        </section>
      )}

      <section aria-labelledby="subdivide-title" className="flex flex-col gap-2">
        <h3 id="subdivide-title" className="font-semibold">Refine the mesh</h3>
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'subdivide', method: 'midpoint' }, 'Midpoint subdivision')}>Midpoint subdivision</Button>
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'subdivide', method: 'loop' }, 'Loop subdivision')}>Loop subdivision</Button>
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'smooth', iterations: 5 }, 'Smoothed the surface')}>Smooth the surface</Button>
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'smooth-curves', iterations: 10 }, 'Smoothed the curves')}>Smooth the curves</Button>
        </div>
      </section>
    </div>
  );
}
