/** What a table row or the pointer points at: a region or an intersection/base point (by viewer point id). */
export type Focus = { kind: 'region'; id: number } | { kind: 'point'; id: string };

export const sameFocus = (a: Focus | null, b: Focus | null) => Boolean(a && b && a.kind === b.kind && a.id === b.id);

/** Row classes: hovered rows tinted, the selected row marked with the accent. */
export function rowClass(hover: Focus | null, selected: Focus | null, f: Focus): string {
  const sel = sameFocus(selected, f);
  const hov = sameFocus(hover, f);
  return [
    'cursor-pointer border-t border-line',
    sel ? 'bg-accent-soft shadow-[inset_3px_0_0_var(--color-accent)]' : hov ? 'bg-warn-soft' : 'hover:bg-paper',
  ].join(' ');
}
