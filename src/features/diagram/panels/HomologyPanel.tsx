import type { FloerSummary } from '../../../../server/contract/index.js';
import { Button } from '../../../lib/ui';
import { regionLabel } from '../format';

export interface HomologyPanelProps {
  floer: FloerSummary | null;
  unavailable: string | null;
  /** Colour the surface by a periodic domain's coefficients and mark its support (null clears). */
  onShowPeriodic: (p: { coefficients: number[]; label: string } | null) => void;
  /** Mark regions as offending (null clears). */
  onShowRegions: (regions: number[] | null) => void;
  showing: string | null;
}

function YesNo({ ok, yes, no }: { ok: boolean | null; yes: string; no: string }) {
  if (ok === null) return <span className="text-ink-muted">Undecided (too many periodic domains)</span>;
  return <span className={ok ? 'font-semibold text-ok' : 'font-semibold text-danger'}>{ok ? yes : no}</span>;
}

/**
 * H_1 (coker of the intersection matrix), periodic domains (≅ H_2, Ozsváth–Szabó 2004), weak admissibility
 * with its witness, niceness (Sarkar–Wang 2010) with the offending regions, and HF-hat ranks by spinᶜ class.
 */
export function HomologyPanel({ floer, unavailable, onShowPeriodic, onShowRegions, showing }: HomologyPanelProps) {
  if (!floer) return <p className="text-sm text-ink-muted">{unavailable ?? 'The Floer summary is not available for this revision.'}</p>;
  const gradings = [...new Set(floer.homology?.bySpinc.flatMap((s) => s.byGrading.map((g) => g.grading)) ?? [])].sort((a, b) => b - a);
  const modulus = floer.homology?.bySpinc.find((s) => s.gradingModulus > 0)?.gradingModulus ?? 0;
  const support = (c: number[]) => c.map((v, r) => (v !== 0 ? r : -1)).filter((r) => r >= 0);
  return (
    <div className="flex flex-col gap-4 text-sm">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
        <dt className="text-ink-muted">H₁(Y)</dt>
        <dd className="font-mono" data-testid="h1">{floer.h1}</dd>
        <dt className="text-ink-muted">b₁</dt>
        <dd>{floer.b1}</dd>
        <dt className="text-ink-muted">Generators</dt>
        <dd className="tabular-nums">{floer.generatorCount ?? 'too many to count'}</dd>
        {floer.h1Order && <><dt className="text-ink-muted">|H₁(Y)|</dt><dd className="tabular-nums">{floer.h1Order}</dd></>}
        {floer.signedCount && (
          <>
            <dt className="text-ink-muted">Signed count</dt>
            <dd data-testid="signed-count">
              <span className="tabular-nums">Σ sign(x) = {floer.signedCount.value}</span>{' '}
              <span className="text-ink-muted">
                (det M = {floer.signedCount.determinant}{floer.signedCount.h1Order ? `; ±|H₁| = ±${floer.signedCount.h1Order}` : ''})
              </span>{' '}
              <span className={floer.signedCount.agrees ? 'font-semibold text-ok' : 'font-semibold text-danger'}>
                {floer.signedCount.agrees ? 'agrees' : 'does not agree — please report'}
              </span>
            </dd>
          </>
        )}
        <dt className="text-ink-muted">Weakly admissible</dt>
        <dd className="flex flex-wrap items-center gap-2">
          <YesNo ok={floer.weaklyAdmissible} yes="Yes" no="No" />
          {floer.admissibilityWitness && (
            <Button size="sm" variant="secondary" aria-pressed={showing === 'witness'} className={showing === 'witness' ? '!bg-accent-soft !border-accent' : ''}
              onClick={() => {
                if (showing === 'witness') { onShowPeriodic(null); onShowRegions(null); return; }
                onShowPeriodic({ coefficients: floer.admissibilityWitness!.coefficients, label: 'witness' });
                onShowRegions(support(floer.admissibilityWitness!.coefficients));
              }}>
              {showing === 'witness' ? 'Hide the offending periodic domain' : 'Show the offending periodic domain'}
            </Button>
          )}
        </dd>
        <dt className="text-ink-muted">Nice</dt>
        <dd className="flex flex-wrap items-center gap-2">
          <YesNo ok={floer.nice} yes="Yes — every region without a basepoint is a bigon or a square" no="No" />
          {floer.notNiceRegions.length > 0 && (
            <>
              <span className="text-ink-muted">({floer.notNiceRegions.map((r) => `${regionLabel(r.region)}: ${r.corners} corners, χ = ${r.chi}`).join('; ')})</span>
              <Button size="sm" variant="secondary" aria-pressed={showing === 'not-nice'} className={showing === 'not-nice' ? '!bg-accent-soft !border-accent' : ''}
                onClick={() => { if (showing === 'not-nice') { onShowRegions(null); onShowPeriodic(null); } else { onShowPeriodic(null); onShowRegions(floer.notNiceRegions.map((r) => r.region)); } }}>
                {showing === 'not-nice' ? 'Hide' : 'Show on the surface'}
              </Button>
            </>
          )}
        </dd>
      </dl>

      <section aria-labelledby="periodic-title">
        <h3 id="periodic-title" className="mb-1 font-semibold">Periodic domains ({floer.periodicDomains.length})</h3>
        {floer.periodicDomains.length === 0 ? (
          <p className="text-ink-muted">None: H₂(Y) = 0.</p>
        ) : (
          <ul className="flex flex-wrap gap-2">
            {floer.periodicDomains.map((p, i) => (
              <li key={i}>
                <Button size="sm" variant="secondary" aria-pressed={showing === `P${i}`} className={showing === `P${i}` ? '!bg-accent-soft !border-accent' : ''}
                  onClick={() => { onShowRegions(null); onShowPeriodic(showing === `P${i}` ? null : { coefficients: p.coefficients, label: `P${i}` }); }}>
                  P{i + 1}
                </Button>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="hf-title">
        <h3 id="hf-title" className="mb-1 font-semibold">HF-hat</h3>
        {!floer.homology ? (
          <p className="text-ink-muted">{floer.homologyUnavailable ?? 'Not computed.'}</p>
        ) : (
          <>
            <p className="mb-2">
              Total rank <span className="font-semibold tabular-nums" data-testid="hf-rank">{floer.homology.rank}</span>
              {floer.homology.rawRank !== floer.homology.rank && (
                <span className="text-ink-muted"> (the complex has rank {floer.homology.rawRank}: HF-hat ⊗ V for the extra basepoints, Manolescu–Ozsváth–Sarkar 2009)</span>
              )}
            </p>
            <div className="overflow-x-auto">
              <table className="border-collapse text-xs" aria-label="HF-hat rank by spinᶜ class and relative grading">
                <caption className="caption-bottom pt-1 text-left text-ink-faint">Ranks by relative grading are of the complex’s homology (raw).</caption>
                <thead className="bg-sunken text-ink-muted">
                  <tr>
                    <th scope="col" className="px-2 py-1.5 text-left">Spinᶜ class</th>
                    <th scope="col" className="px-2 py-1.5 text-right">Generators</th>
                    <th scope="col" className="px-2 py-1.5 text-right">Rank</th>
                    {gradings.map((g) => <th key={g} scope="col" className="px-2 py-1.5 text-right">gr {g}{modulus ? ` mod ${modulus}` : ''}</th>)}
                  </tr>
                </thead>
                <tbody>
                  {floer.homology.bySpinc.map((s) => (
                    <tr key={s.spinc} className="border-t border-line">
                      <th scope="row" className="px-2 py-1 text-left font-mono font-medium">{s.spinc}</th>
                      <td className="px-2 py-1 text-right tabular-nums">{s.generators}</td>
                      <td className="px-2 py-1 text-right font-semibold tabular-nums">{s.rank ?? `${s.rawRank} (raw)`}</td>
                      {gradings.map((g) => {
                        const r = s.byGrading.find((b) => b.grading === g)?.rank ?? 0;
                        return <td key={g} className={`px-2 py-1 text-right tabular-nums ${r ? '' : 'text-ink-faint'}`}>{r || '·'}</td>;
                      })}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </>
        )}
      </section>
    </div>
  );
}
