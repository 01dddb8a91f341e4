import type { ReactNode } from 'react';
import { cx } from './cx';

export type AlertTone = 'error' | 'info' | 'success';

const tones: Record<AlertTone, string> = {
  error: 'border-danger/40 bg-danger-soft text-danger',
  info: 'border-line bg-sunken text-ink',
  success: 'border-ok/40 bg-ok-soft text-ok',
};

export interface AlertProps {
  tone?: AlertTone;
  title?: string;
  children?: ReactNode;
  className?: string;
}

/**
 * A message box. Errors use role="alert" (announced at once); others role="status" (polite).
 * Render it conditionally inside an always-present live region if it must be announced on appearance
 * — or simply rely on role="alert", which screen readers announce when inserted.
 */
export function Alert({ tone = 'info', title, children, className }: AlertProps) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={cx('rounded-md border px-4 py-3 text-sm', tones[tone], className)}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={cx(title && 'mt-1')}>{children}</div>}
    </div>
  );
}
