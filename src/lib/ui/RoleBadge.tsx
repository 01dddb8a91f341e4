import type { Role } from '../../../server/contract/index.js';
import { cx } from './cx';

const styles: Record<Role, string> = {
  owner: 'bg-accent-soft text-accent-strong border-accent/30',
  editor: 'bg-warn-soft text-[#7a4b00] border-[#e0c27a]',
  viewer: 'bg-sunken text-ink-muted border-line',
};

/** Human label of a role. */
export const ROLE_LABELS: Record<Role, string> = { owner: 'Owner', editor: 'Editor', viewer: 'Viewer' };

/** A small pill showing a workspace role. */
export function RoleBadge({ role }: { role: Role }) {
  return (
    <span className={cx('inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-medium', styles[role])}>
      {ROLE_LABELS[role]}
    </span>
  );
}
