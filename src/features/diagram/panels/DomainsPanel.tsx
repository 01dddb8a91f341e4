import { useState } from 'react';
import type { DomainCheckResponse, Region } from '../../../../server/contract/index.js';
import { errorMessage } from '../../../lib/api';
import { Button, Spinner, TextField } from '../../../lib/ui';
import { normalizeCoefficients, useDeleteDomain, useDomainCheck, useSaveDomain, useSavedDomains } from '../api';
import { basepointNames, dateText, generatorText, parsePointList, rationalTex, rationalText, regionLabel } from '../format';
import { Tex } from '../Tex';
import { rowClass, type Focus } from './shared';

export interface DomainsPanelProps {
  diagramId: string;
  revision: number;
  regions: Region[];
  /** Number of intersection points (named x1 … xN). */
  pointCount: number;
  domain: Record<number, number>;
  onChange: (next: Record<number, number>) => void;
  canEdit: boolean;
  hover: Focus | null;
  selected: Focus | null;
  onHover: (f: Focus | null) => void;
}

/** μ = e + n_x + n_y (Lipshitz 2006, §4) typeset with the server's exact values. */
function MaslovFormula({ check }: { check: DomainCheckResponse }) {
  const e = rationalTex(check.eulerMeasure);
  if (check.maslovIndex === null) {
    return <Tex tex={`e(D) = ${e}`} label={`e of D equals ${check.eulerMeasure}`} display />;
  }
  const tex = `\\mu(D) = e(D) + n_{\\mathbf{x}}(D) + n_{\\mathbf{y}}(D) = ${e} + ${rationalTex(check.nx)} + ${rationalTex(check.ny)} = ${rationalTex(check.maslovIndex)}`;
  const label = `mu of D equals e plus n x plus n y, which is ${check.eulerMeasure} plus ${check.nx} plus ${check.ny}, equals ${check.maslovIndex}`;
  return <Tex tex={tex} label={label} display />;
}

function CheckReport({ check }: { check: DomainCheckResponse }) {
  return (
    <div className="flex flex-col gap-2">
      <p className={check.isDomain ? 'font-semibold text-ok' : 'font-semibold text-danger'} data-testid="domain-status">
        {check.isDomain ? 'This is a domain.' : 'Not a domain.'}
        {check.reason && <span className="block font-normal text-ink">{check.reason}</span>}
      </p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-ink-muted">x (start)</dt><dd data-testid="domain-x">{generatorText(check.from)}</dd>
        <dt className="text-ink-muted">y (end)</dt><dd data-testid="domain-y">{generatorText(check.to)}</dd>
        <dt className="text-ink-muted">e(D)</dt><dd className="tabular-nums">{rationalText(check.eulerMeasure)}
          {check.geometricEulerMeasure !== null && <span className="text-ink-muted"> (Gauss–Bonnet {check.geometricEulerMeasure.toFixed(4)})</span>}</dd>
        <dt className="text-ink-muted">n_x, n_y</dt><dd className="tabular-nums">{rationalText(check.nx)}, {rationalText(check.ny)}</dd>
        {check.nBasepoints.map((b) => (
          <div key={b.name} className="contents"><dt className="text-ink-muted">n at {basepointNames([b.name])}</dt><dd className="tabular-nums">{b.n}</dd></div>
        ))}
        <dt className="text-ink-muted">μ</dt>
        <dd className="font-semibold tabular-nums" data-testid="maslov-index">{check.maslovIndex === null ? '—' : rationalText(check.maslovIndex)}</dd>
        <dt className="text-ink-muted">Positive</dt><dd>{check.positive ? 'Yes' : 'No'}</dd>
        <dt className="text-ink-muted">Periodic</dt><dd>{check.periodic ? 'Yes' : 'No'}</dd>
      </dl>
      <div className="overflow-x-auto rounded-md bg-paper px-2 py-1"><MaslovFormula check={check} /></div>
    </div>
  );
}

/**
 * Build a domain D = Σ a_R R by clicking regions (or with the buttons), check it live on the server
 * (boundary condition of Ozsváth–Szabó 2004; μ by Lipshitz 2006), save it with a name and load saved ones.
 */
export function DomainsPanel(p: DomainsPanelProps) {
  const coefficients = normalizeCoefficients(p.domain);
  const empty = Object.keys(coefficients).length === 0;
  const [fromText, setFromText] = useState('');
  const [toText, setToText] = useState('');
  const from = parsePointList(fromText, p.pointCount), to = parsePointList(toText, p.pointCount);
  const ends = { ...(Array.isArray(from) ? { from } : {}), ...(Array.isArray(to) ? { to } : {}) };
  const check = useDomainCheck(p.diagramId, p.revision, coefficients, ends);
  const saved = useSavedDomains(p.diagramId);
  const save = useSaveDomain(p.diagramId);
  const remove = useDeleteDomain(p.diagramId);
  const [name, setName] = useState('');
  const [nameError, setNameError] = useState<string | null>(null);
  const bump = (r: number, d: number) => p.onChange({ ...p.domain, [r]: (p.domain[r] ?? 0) + d });

  return (
    <div className="flex flex-col gap-4 text-sm">
      <p className="text-xs text-ink-muted">
        Click a region on the surface to add 1 to its coefficient; shift-click or right-click subtracts 1. The
        surface is coloured by the coefficients.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-xs" aria-label="Domain coefficients">
          <thead className="bg-sunken text-left text-ink-muted">
            <tr><th scope="col" className="px-2 py-1.5">Region</th><th scope="col" className="px-2 py-1.5 text-center">Coefficient</th><th scope="col" className="px-2 py-1.5">Basepoints</th></tr>
          </thead>
          <tbody>
            {p.regions.map((r) => {
              const f: Focus = { kind: 'region', id: r.id };
              const a = p.domain[r.id] ?? 0;
              return (
                <tr key={r.id} className={rowClass(p.hover, p.selected, f)} onMouseEnter={() => p.onHover(f)} onMouseLeave={() => p.onHover(null)} data-testid="domain-row">
                  <th scope="row" className="px-2 py-1 text-left font-medium">{regionLabel(r.id)}</th>
                  <td className="px-2 py-1">
                    <div className="flex items-center justify-center gap-2">
                      <button type="button" className="h-6 w-6 rounded border border-line-strong bg-surface" aria-label={`Subtract 1 from ${regionLabel(r.id)}`} onClick={() => bump(r.id, -1)}>−</button>
                      <output className={`w-8 text-center tabular-nums ${a ? 'font-semibold' : 'text-ink-faint'}`} aria-label={`Coefficient of ${regionLabel(r.id)}`}>{a}</output>
                      <button type="button" className="h-6 w-6 rounded border border-line-strong bg-surface" aria-label={`Add 1 to ${regionLabel(r.id)}`} onClick={() => bump(r.id, 1)}>+</button>
                    </div>
                  </td>
                  <td className="px-2 py-1">{basepointNames(r.basepoints)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div className="flex gap-2">
        <Button size="sm" variant="secondary" onClick={() => p.onChange({})} disabled={empty}>Clear</Button>
      </div>

      <fieldset className="grid grid-cols-2 gap-2">
        <legend className="mb-1 text-xs text-ink-muted">
          Generators, optional: needed when the boundary does not fix them (a periodic domain goes from x to x).
        </legend>
        <TextField label="x (start)" placeholder="e.g. x1, x4" value={fromText} onChange={(e) => setFromText(e.target.value)}
          error={typeof from === 'string' ? from : null} />
        <TextField label="y (end)" placeholder="e.g. x2, x4" value={toText} onChange={(e) => setToText(e.target.value)}
          error={typeof to === 'string' ? to : null} />
      </fieldset>

      <section aria-labelledby="check-title" aria-live="polite" className="rounded-md border border-line p-3">
        <h3 id="check-title" className="mb-2 flex items-center gap-2 font-semibold">
          Boundary check {check.isFetching && <Spinner size={12} />}
        </h3>
        {empty && <p className="text-ink-muted">All coefficients are 0. Click regions to build a domain.</p>}
        {!empty && check.error && <p role="alert" className="text-danger">{errorMessage(check.error)}</p>}
        {!empty && check.data && <CheckReport check={check.data} />}
      </section>

      {p.canEdit && (
        <form className="flex items-end gap-2" onSubmit={(e) => {
          e.preventDefault();
          if (!name.trim()) { setNameError('Enter a name.'); return; }
          if (empty) { setNameError('Give some region a nonzero coefficient first.'); return; }
          save.mutate(
            { name: name.trim(), revision: p.revision, coefficients, ...(check.data?.from && check.data.to ? { from: check.data.from, to: check.data.to } : {}) },
            { onSuccess: () => setName('') },
          );
        }}>
          <TextField label="Save this domain as" value={name} onChange={(e) => { setName(e.target.value); setNameError(null); }} error={nameError ?? (save.error ? errorMessage(save.error) : null)} containerClassName="flex-1" maxLength={160} />
          <Button type="submit" loading={save.isPending}>Save</Button>
        </form>
      )}

      <section aria-labelledby="saved-title">
        <h3 id="saved-title" className="mb-1 font-semibold">Saved domains</h3>
        {saved.data?.domains.length ? (
          <ul className="divide-y divide-line rounded-md border border-line">
            {saved.data.domains.map((d) => (
              <li key={d.id} className="flex items-center justify-between gap-2 px-3 py-2">
                <span>
                  <span className="font-medium">{d.name}</span>
                  <span className="block text-xs text-ink-muted">revision {d.revision} · {d.createdBy.name} · {dateText(d.createdAt)}{d.revision !== p.revision ? ' · saved on another revision' : ''}</span>
                </span>
                <span className="flex gap-1">
                  <Button size="sm" variant="secondary" onClick={() => p.onChange(Object.fromEntries(Object.entries(d.coefficients).map(([k, v]) => [Number(k), v])))}>Load</Button>
                  {p.canEdit && <Button size="sm" variant="ghost" onClick={() => remove.mutate(d.id)} aria-label={`Delete ${d.name}`}>Delete</Button>}
                </span>
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-ink-muted">{saved.isPending ? 'Loading…' : 'None yet.'}</p>
        )}
      </section>
    </div>
  );
}
