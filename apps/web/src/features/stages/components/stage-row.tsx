import { useEffect, useState, type FormEvent } from 'react';
import { UpdateStageInput, type Stage } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import { validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useUpdateStage } from '../api/update-stage';
import { readWipLimit } from '../lib/wip-limit-text';
import { StageActionError } from './stage-action-error';

interface StageRowProps {
  stage: Stage;
  place: number;
  count: number;
  onMove: (stageId: string, by: -1 | 1) => void;
  isReordering: boolean;
}

const jobsLabel = (n: number) => (n === 1 ? '1 job' : `${n} jobs`);

/** One active stage: rename, WIP limit, move up or down, archive. */
export function StageRow({ stage, place, count, onMove, isReordering }: StageRowProps) {
  const update = useUpdateStage();
  const form = useFormErrors();
  const [name, setName] = useState(stage.name);
  const [wipText, setWipText] = useState(stage.wipLimit === null ? '' : String(stage.wipLimit));
  // A saved change (here or from another screen) becomes the new starting point of the fields.
  useEffect(() => setName(stage.name), [stage.name]);
  useEffect(() => setWipText(stage.wipLimit === null ? '' : String(stage.wipLimit)), [stage.wipLimit]);
  const wip = readWipLimit(wipText);
  const isChanged = name.trim() !== stage.name || !wip.ok || wip.value !== stage.wipLimit;

  function save(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!wip.ok) return form.showFields({ wipLimit: [wip.message] });
    const changes = {
      name: name.trim() !== stage.name ? name : undefined,
      wipLimit: wip.value !== stage.wipLimit ? wip.value : undefined,
    };
    const result = validateForm(UpdateStageInput, changes);
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    update.mutate(
      { stageId: stage.id, changes: result.data },
      { onSuccess: (saved) => showToast('success', `Saved ${saved.name}.`), onError: form.showApiFields },
    );
  }

  function archive() {
    form.reset();
    update.mutate(
      { stageId: stage.id, changes: { isArchived: true } },
      { onSuccess: (saved) => showToast('success', `${saved.name} is archived. Restore it below whenever you need it.`) },
    );
  }

  return (
    <li className="rounded-lg border border-graphite-300 bg-white p-3">
      <form ref={form.formRef} noValidate onSubmit={save} className="grid gap-3 md:grid-cols-[2rem_1fr_8rem_auto] md:items-end">
        <span className="text-lg font-bold text-graphite-600 tabular-figures md:pb-2" aria-hidden="true">
          {place}
        </span>
        <Field label="Name" error={form.errorFor('name')}>
          {(control) => (
            <TextInput {...control} value={name} onChange={(e) => { setName(e.target.value); form.clearField('name'); }} className="min-h-9" />
          )}
        </Field>
        <Field label="WIP limit" error={form.errorFor('wipLimit')}>
          {(control) => (
            <TextInput
              {...control}
              inputMode="numeric"
              placeholder="None"
              value={wipText}
              onChange={(e) => { setWipText(e.target.value); form.clearField('wipLimit'); }}
              className="min-h-9 tabular-figures"
            />
          )}
        </Field>
        <div className="flex flex-wrap items-center gap-2">
          <Button type="submit" size="sm" disabled={!isChanged} isPending={update.isPending && update.variables?.changes.isArchived === undefined}>
            Save<span className="sr-only"> {stage.name}</span>
          </Button>
          <Button size="sm" variant="secondary" aria-label={`Move ${stage.name} up`} onClick={() => onMove(stage.id, -1)} disabled={place === 1 || isReordering}>
            Up
          </Button>
          <Button size="sm" variant="secondary" aria-label={`Move ${stage.name} down`} onClick={() => onMove(stage.id, 1)} disabled={place === count || isReordering}>
            Down
          </Button>
          <Button size="sm" variant="secondary" onClick={archive} isPending={update.isPending && update.variables?.changes.isArchived === true}>
            Archive<span className="sr-only"> {stage.name}</span>
          </Button>
          <span className="w-14 text-sm text-graphite-600 tabular-figures">{jobsLabel(stage.jobCount)}</span>
        </div>
      </form>
      {update.isError && (
        <div className="mt-3">
          <StageActionError error={update.error} />
        </div>
      )}
    </li>
  );
}
