import { useState } from 'react';
import type { CurveRef, EditOperationInput, SurfacePoint } from '../../../../server/contract/index.js';
import type { Vec3 } from '../../../viewer/types';
import { Button, SelectField } from '../../../lib/ui';
import { curveLabel } from '../format';

/** Points picked on the surface for a new curve or a finger move. */
export interface DrawState {
  purpose: 'curve' | 'finger';
  family: 'alpha' | 'beta';
  /** For a finger move: the curve pushed along the path. */
  curve: CurveRef | null;
  points: SurfacePoint[];
  world: Vec3[];
}

export interface EditPanelProps {
  curves: CurveRef[];
  isHead: boolean;
  busy: boolean;
  draw: DrawState | null;
  onDraw: (d: DrawState | null) => void;
  onApply: (op: EditOperationInput, message: string) => void;
}

const refKey = (c: CurveRef) => `${c.family}:${c.index}`;
const parseRef = (k: string): CurveRef => { const [family, index] = k.split(':'); return { family: family as 'alpha' | 'beta', index: Number(index) }; };
const labelOf = (k: string) => { const r = parseRef(k); return curveLabel(r.family, r.index); };

/** Drawing curves and the server's operations; each applied change becomes a new revision. */
export function EditPanel({ curves, isHead, busy, draw, onDraw, onApply }: EditPanelProps) {
  const options = curves.map((c) => ({ value: refKey(c), label: curveLabel(c.family, c.index) }));
  const [family, setFamily] = useState<'alpha' | 'beta'>('alpha');
  const [twistCurve, setTwistCurve] = useState(options.find((o) => o.value.startsWith('beta'))?.value ?? options[0]?.value ?? '');
  const [twistAlong, setTwistAlong] = useState(options.find((o) => o.value.startsWith('alpha'))?.value ?? options[0]?.value ?? '');
  const [negative, setNegative] = useState(false);
  const [fingerCurve, setFingerCurve] = useState(options.find((o) => o.value.startsWith('beta'))?.value ?? options[0]?.value ?? '');

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
              {draw.purpose === 'curve' ? `Drawing a new ${draw.family === 'alpha' ? 'α' : 'β'} curve` : `Finger move of ${draw.curve ? curveLabel(draw.curve.family, draw.curve.index) : ''}`}:
              {' '}{draw.points.length} point{draw.points.length === 1 ? '' : 's'} picked. Click on the surface to add points
              {draw.purpose === 'curve' ? '; the curve closes back to the first point.' : ', starting next to the curve.'}
            </p>
            <div className="flex flex-wrap gap-2">
              <Button size="sm" variant="secondary" disabled={draw.points.length === 0} onClick={() => onDraw({ ...draw, points: draw.points.slice(0, -1), world: draw.world.slice(0, -1) })}>Undo last point</Button>
              <Button size="sm" variant="ghost" onClick={() => onDraw(null)}>Cancel</Button>
              <Button size="sm" disabled={draw.points.length < (draw.purpose === 'curve' ? 3 : 2) || busy} loading={busy}
                onClick={() => {
                  if (draw.purpose === 'curve') onApply({ type: 'draw-curve', family: draw.family, points: draw.points, closed: true }, `Drew a ${draw.family} curve`);
                  else if (draw.curve) onApply({ type: 'finger-move', curve: draw.curve, path: draw.points }, `Finger move of ${curveLabel(draw.curve.family, draw.curve.index)}`);
                }}>
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

      <section aria-labelledby="subdivide-title" className="flex flex-col gap-2">
        <h3 id="subdivide-title" className="font-semibold">Refine the mesh</h3>
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'subdivide', method: 'midpoint' }, 'Midpoint subdivision')}>Midpoint subdivision</Button>
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'subdivide', method: 'loop' }, 'Loop subdivision')}>Loop subdivision</Button>
          <Button variant="secondary" disabled={busy || drawing} onClick={() => onApply({ type: 'smooth', iterations: 5 }, 'Smoothed positions')}>Smooth</Button>
        </div>
      </section>
    </div>
  );
}
