import { useMemo } from 'react';
import katex from 'katex';
import 'katex/dist/katex.min.css';

/**
 * A formula typeset with KaTeX (bundled, no network). `label` is the accessible text read by screen readers
 * (KaTeX's MathML is also present, but a plain sentence reads better).
 */
export function Tex({ tex, label, display = false, className }: { tex: string; label: string; display?: boolean; className?: string }) {
  const html = useMemo(() => katex.renderToString(tex, { displayMode: display, throwOnError: false, output: 'html' }), [tex, display]);
  return (
    <span className={className} role="math" aria-label={label}>
      <span aria-hidden="true" dangerouslySetInnerHTML={{ __html: html }} />
    </span>
  );
}
