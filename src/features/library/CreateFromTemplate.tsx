import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { TemplateKind } from '../../../server/contract/index.js';
import { errorMessage } from '../../lib/api';
import { Alert, Button, SelectField, TextField } from '../../lib/ui';
import { useCreateDiagram } from './api';
import { defaultsFor, DEFAULT_FORM, suggestedName, TEMPLATE_LABELS, toTemplateSpec, type TemplateErrors, type TemplateForm } from './templates';

/** Form: pick a template, fill its parameters (validated in place), create, go to the new diagram. */
export function CreateFromTemplate({ workspaceId, onDone }: { workspaceId: string; onDone: () => void }) {
  const [form, setForm] = useState<TemplateForm>(DEFAULT_FORM);
  const [name, setName] = useState('');
  const [resolution, setResolution] = useState('');
  const [errors, setErrors] = useState<TemplateErrors>({});
  const create = useCreateDiagram(workspaceId);
  const navigate = useNavigate();

  const set = (patch: Partial<TemplateForm>) => { setForm((f) => ({ ...f, ...patch })); setErrors({}); };
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const { spec, errors: errs } = toTemplateSpec(form);
    setErrors(errs);
    if (!spec) return;
    create.mutate(
      { name: name.trim() || suggestedName(form), template: spec, ...(resolution ? { resolution: Number(resolution) } : {}) },
      { onSuccess: (r) => { onDone(); navigate(`/w/${workspaceId}/d/${r.diagram.id}`); } },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Create from a template" className="grid gap-4 sm:grid-cols-2">
      <SelectField
        label="Template"
        value={form.kind}
        onChange={(e) => { setForm(defaultsFor(e.target.value as TemplateKind)); setErrors({}); }}
        containerClassName="sm:col-span-2"
        options={(Object.keys(TEMPLATE_LABELS) as TemplateKind[]).map((k) => ({ value: k, label: TEMPLATE_LABELS[k] }))}
      />
      {(form.kind === 'lens' || form.kind === 'torus-curve') && (
        <>
          <TextField label="p" inputMode="numeric" value={form.p} onChange={(e) => set({ p: e.target.value })} error={errors.p}
            hint={form.kind === 'lens' ? 'β meets α in p points; HF-hat has rank p.' : 'Times around the long way.'} />
          <TextField label="q" inputMode="numeric" value={form.q} onChange={(e) => set({ q: e.target.value })} error={errors.q}
            hint="Coprime to p." />
        </>
      )}
      {(form.kind === 's3' || form.kind === 's1xs2') && (
        <TextField label="Genus g" inputMode="numeric" value={form.genus} onChange={(e) => set({ genus: e.target.value })} error={errors.genus} hint="1 to 6." />
      )}
      {form.kind === 'grid' && (
        <>
          <TextField label="X markings (row of each column)" value={form.x} onChange={(e) => set({ x: e.target.value })} error={errors.x}
            hint="Comma-separated permutation of 0…n−1." className="font-mono" />
          <TextField label="O markings (row of each column)" value={form.o} onChange={(e) => set({ o: e.target.value })} error={errors.o}
            hint="No column may put X and O in one row." className="font-mono" />
        </>
      )}
      <TextField label="Name" value={name} placeholder={suggestedName(form)} onChange={(e) => setName(e.target.value)} maxLength={160} />
      <SelectField label="Mesh resolution" value={resolution} onChange={(e) => setResolution(e.target.value)} hint="Finer meshes look smoother; analysis takes longer."
        options={[{ value: '', label: 'Standard' }, ...[1, 2, 3, 4, 5, 6, 7, 8].map((r) => ({ value: String(r), label: r === 1 ? '1 (coarsest)' : r === 8 ? '8 (finest)' : String(r) }))]} />
      {create.error && <Alert tone="error" className="sm:col-span-2">{errorMessage(create.error)}</Alert>}
      <div className="flex gap-3 sm:col-span-2">
        <Button type="submit" loading={create.isPending}>Create diagram</Button>
        <Button variant="ghost" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}
