import { useState } from 'react';
import type { CatalogueOperation, FieldErrors, Part } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { isApiError } from '@/lib/api-client';
import { useCreateOperation } from '../api/create-operation';
import { conflictingOperation, useUpdateOperation } from '../api/update-operation';
import { COMPONENT_CHOICES, EMPTY_OPERATION, draftOf, toOperationChanges, toOperationInput, type OperationDraft } from '../lib/operation-form';
import { CatalogueLinesEditor } from './catalogue-lines-editor';

interface OperationFormProps {
  /** Absent: a new operation. */
  operation?: CatalogueOperation;
  parts: readonly Part[];
  currency: string;
  canSeeCosts: boolean;
  onSaved: (operation: CatalogueOperation) => void;
}

const PIANO_TYPES = [
  { value: '', label: 'Any piano' },
  { value: 'grand', label: 'Grand' },
  { value: 'upright', label: 'Upright' },
];

/** Add or edit a standard operation: what it remedies, and its default tasks, parts and work sent out. */
export function OperationForm({ operation, parts, currency, canSeeCosts, onSaved }: OperationFormProps) {
  const create = useCreateOperation();
  const update = useUpdateOperation();
  const [base, setBase] = useState(() => ({ version: operation?.version ?? 0, draft: operation ? draftOf(operation, currency) : EMPTY_OPERATION }));
  const [draft, setDraft] = useState<OperationDraft>(base.draft);
  const [fields, setFields] = useState<FieldErrors>({});
  const [theirs, setTheirs] = useState<CatalogueOperation | null>(null);
  const set = (changes: Partial<OperationDraft>) => setDraft((d) => ({ ...d, ...changes }));
  const errorFor = (name: string) => fields[name]?.[0];
  const error = operation ? update.error : create.error;
  const onError = (e: unknown) => {
    const current = conflictingOperation(e);
    if (current) return setTheirs(current);
    if (isApiError(e) && e.fields) setFields(e.fields);
  };

  function save(version = base.version) {
    setTheirs(null);
    if (!operation) {
      const result = toOperationInput(draft, currency);
      if (!result.ok) return setFields(result.fields);
      setFields({});
      return create.mutate(result.input, { onSuccess: onSaved, onError });
    }
    const result = toOperationChanges(draft, base.draft, version, currency);
    if (!result.ok) return setFields(result.fields);
    setFields({});
    update.mutate({ operationId: operation.id, changes: result.changes }, { onSuccess: onSaved, onError });
  }

  return (
    <form noValidate className="max-w-4xl space-y-5" onSubmit={(e) => (e.preventDefault(), save())}>
      {theirs && (
        <Alert tone="error" title="Someone else saved this operation while you were editing it.">
          <p>Your changes are still in the form.</p>
          <div className="mt-3 flex flex-wrap gap-2">
            <Button size="sm" onClick={() => { setBase((b) => ({ ...b, version: theirs.version })); save(theirs.version); }}>Save mine over theirs</Button>
            <Button size="sm" variant="secondary" onClick={() => { const next = draftOf(theirs, currency); setBase({ version: theirs.version, draft: next }); setDraft(next); setTheirs(null); }}>Show their version</Button>
          </div>
        </Alert>
      )}
      <FormError error={theirs ? null : error} except={['validation_failed', 'version_conflict']} />
      {isApiError(error) && error.code === 'validation_failed' && Object.keys(fields).length === 0 && <Alert tone="error" title={error.message} />}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <Field label="Name" error={errorFor('name')}>
          {(control) => <TextInput {...control} value={draft.name} onChange={(e) => set({ name: e.target.value })} />}
        </Field>
        <Field label="For" error={errorFor('pianoType')}>
          {(control) => <Select {...control} value={draft.pianoType} options={PIANO_TYPES} onChange={(e) => set({ pianoType: e.target.value as OperationDraft['pianoType'] })} />}
        </Field>
      </div>
      <Field label="Description" hint="Optional; what the work involves" error={errorFor('description')}>
        {(control) => <Textarea {...control} rows={2} value={draft.description} onChange={(e) => set({ description: e.target.value })} />}
      </Field>
      <fieldset>
        <legend className="font-semibold">Remedies these survey components</legend>
        <p className="text-sm text-graphite-600">Preparing an estimate proposes this operation for them when graded Needs work or Replace.</p>
        {errorFor('componentKeys') && <p className="font-semibold text-damper">{errorFor('componentKeys')}</p>}
        <div className="mt-2 grid gap-x-4 sm:grid-cols-2 lg:grid-cols-3">
          {[...COMPONENT_CHOICES, ...draft.componentKeys.filter((k) => !COMPONENT_CHOICES.some((c) => c.key === k)).map((key) => ({ key, name: key }))].map((c) => (
            <Checkbox
              key={c.key}
              isCompact
              label={c.name}
              checked={draft.componentKeys.includes(c.key)}
              onChange={(e) => set({ componentKeys: e.target.checked ? [...draft.componentKeys, c.key] : draft.componentKeys.filter((k) => k !== c.key) })}
            />
          ))}
        </div>
      </fieldset>
      <section aria-labelledby="operation-lines-heading" className="space-y-2">
        <h2 id="operation-lines-heading" className="text-lg font-semibold">Default lines</h2>
        <CatalogueLinesEditor lines={draft.lines} parts={parts} canSeeCosts={canSeeCosts} errorFor={errorFor} onChange={(lines) => set({ lines })} />
      </section>
      <div>
        <Checkbox label="In use (offered when preparing estimates)" checked={draft.isActive} onChange={(e) => set({ isActive: e.target.checked })} />
      </div>
      <Button type="submit" isPending={create.isPending || update.isPending}>{operation ? 'Save changes' : 'Add operation'}</Button>
    </form>
  );
}
