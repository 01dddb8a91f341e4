import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Logo } from '../../lib/ui';

/** A torus with one alpha (meridian) and one beta (longitude) curve — the simplest Heegaard picture. */
function TorusSketch() {
  return (
    <svg viewBox="0 0 320 200" className="w-full max-w-sm" aria-hidden="true">
      <ellipse cx="160" cy="100" rx="140" ry="72" fill="var(--color-surface)" stroke="var(--color-ink)" strokeWidth="2" />
      <path d="M98 98c30-26 94-26 124 0" fill="none" stroke="var(--color-ink)" strokeWidth="2" />
      <path d="M108 92c28 22 76 22 104 0" fill="none" stroke="var(--color-ink)" strokeWidth="2" />
      {/* beta: the longitude around the hole */}
      <ellipse cx="160" cy="98" rx="100" ry="46" fill="none" stroke="var(--color-curve-beta)" strokeWidth="3.5" />
      {/* alpha: a meridian through the tube, front solid, back dashed */}
      <path d="M250 64c-16 6-20 34-8 46" fill="none" stroke="var(--color-curve-alpha)" strokeWidth="3.5" strokeLinecap="round" />
      <path d="M250 64c10 8 10 36-8 46" fill="none" stroke="var(--color-curve-alpha)" strokeWidth="2.5" strokeDasharray="4 5" />
      <circle cx="214" cy="150" r="5" fill="var(--color-point-z)" />
      <text x="258" y="94" fontSize="15" fill="var(--color-curve-alpha)" fontStyle="italic">α</text>
      <text x="40" y="86" fontSize="15" fill="var(--color-curve-beta)" fontStyle="italic">β</text>
      <text x="223" y="155" fontSize="13" fill="var(--color-ink-muted)" fontStyle="italic">z</text>
    </svg>
  );
}

/** The frame of the sign-in and sign-up pages: illustration on wide screens, the form card beside it. */
export function AuthLayout({ title, subtitle, children, footer }: { title: string; subtitle?: string; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="min-h-screen lg:grid lg:grid-cols-[1fr_minmax(28rem,36rem)]">
      <aside className="hidden flex-col justify-between border-r border-line bg-sunken px-12 py-10 lg:flex">
        <Link to="/" className="w-fit no-underline" aria-label="Quadrant home">
          <Logo />
        </Link>
        <div className="max-w-md">
          <TorusSketch />
          <p className="mt-8 text-2xl font-medium leading-snug tracking-tight text-ink">
            Heegaard diagrams as meshes you can turn in your hands.
          </p>
          <p className="mt-3 text-ink-muted">
            Upload a triangulated surface, label curves along its edges, and let Quadrant derive the regions,
            intersection points, domains and their counts — with sources for every formula.
          </p>
        </div>
        <p className="text-xs text-ink-faint">α curves in blue, β curves in vermilion — distinguishable for every colour vision.</p>
      </aside>
      <main id="main" className="flex min-h-screen flex-col items-center justify-center px-6 py-12">
        <div className="w-full max-w-sm">
          <div className="mb-8 lg:hidden">
            <Logo />
          </div>
          <h1 className="text-3xl font-semibold tracking-tight">{title}</h1>
          {subtitle && <p className="mt-2 text-ink-muted">{subtitle}</p>}
          <div className="mt-8">{children}</div>
          {footer && <div className="mt-8 border-t border-line pt-6 text-sm text-ink-muted">{footer}</div>}
        </div>
      </main>
    </div>
  );
}
