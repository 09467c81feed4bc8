import { useState } from 'react';
import type { Estimate, EstimateLineKind } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { FormError } from '@/components/form-error';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useIssueEstimate } from '../api/issue-estimate';
import { conflictingEstimate, useUpdateEstimate } from '../api/update-estimate';
import { useEstimateDraft } from '../hooks/use-estimate-draft';
import { addChoice, addLine, addOption, previewKeys, removeLine, removeOption, renameChoice, renameOption, updateLine } from '../lib/draft-edits';
import { choicesOf, draftContent, draftTotals, newLine, type CataloguePart } from '../lib/estimate-draft';
import { ChoiceEditor } from './choice-editor';
import { DraftHeading } from './draft-heading';
import { LineGroup } from './line-group';
import { TotalsPanel } from './totals-panel';

export interface EstimateEditorProps {
  estimate: Estimate;
  canSeeCosts: boolean;
  labourRateMinorPerHour: number | undefined;
  tasks: ReadonlyArray<{ id: string; title: string }>;
  parts: readonly CataloguePart[];
}

/** Fields that have no input of their own are listed above the form. */
const GENERAL_FIELDS = ['lines', 'options', '_', 'copyFromId'];

/** A draft estimate: lines in groups, the client's choices, live totals, save and issue. */
export function EstimateEditor({ estimate, canSeeCosts, labourRateMinorPerHour, tasks, parts }: EstimateEditorProps) {
  const state = useEstimateDraft(estimate);
  const update = useUpdateEstimate(estimate.jobId);
  const issue = useIssueEstimate(estimate.jobId);
  const form = useFormErrors();
  const [preview, setPreview] = useState<string[]>([]);
  const [isConfirmingIssue, setConfirmingIssue] = useState(false);
  const { draft } = state;
  const currency = estimate.currency;
  const taxRate = estimate.taxRateBasisPoints ?? 0;
  const chosen = previewKeys(draft, preview);
  const figures = draftTotals(draft, chosen, taxRate, currency);
  const edit = state.edit;

  function save(then?: (saved: Estimate) => void) {
    const result = draftContent(draft, currency, canSeeCosts);
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    update.mutate(
      { estimateId: estimate.id, changes: { version: state.version, ...result.data } },
      {
        onSuccess: (saved) => {
          state.saved(saved);
          if (then) then(saved);
          else showToast('success', `Saved the draft of estimate ${saved.revision}.`);
        },
        onError: (error) => {
          const current = conflictingEstimate(error);
          if (current) return state.conflicted(current);
          form.showApiFields(error);
        },
      },
    );
  }

  function issueNow() {
    const send = () => issue.mutate({ estimateId: estimate.id }, { onSuccess: (issued) => showToast('success', `Estimate ${issued.revision} issued. Record the client’s answer when it comes.`), onSettled: () => setConfirmingIssue(false) });
    if (state.isDirty) save(send);
    else send();
  }

  const ctx = { currency, canSeeCosts, tasks, parts, options: draft.options, errorFor: form.errorFor };
  const lineHandlers = {
    amounts: figures.lineAmounts,
    onChange: (uid: string, changes: Parameters<typeof updateLine>[2]) => {
      edit((d) => updateLine(d, uid, changes));
      const index = draft.lines.findIndex((l) => l.uid === uid);
      for (const key of Object.keys(changes)) form.clearField(`lines.${index}.${key === 'hours' ? 'minutes' : key === 'quantity' ? 'quantityMilli' : key === 'unitPrice' ? 'unitPriceMinor' : key === 'unitCost' ? 'unitCostMinor' : key}`);
    },
    onRemove: (uid: string) => edit((d) => removeLine(d, uid)),
    onAdd: (kind: EstimateLineKind, optionKey: string | null) =>
      edit((d) => addLine(d, newLine(kind, optionKey, { labourRateMinorPerHour, part: parts[0], currency }))),
  };
  const general = GENERAL_FIELDS.flatMap((key) => form.fields[key] ?? []);

  return (
    <form ref={form.formRef} noValidate onSubmit={(e) => (e.preventDefault(), save())} aria-label={`Draft of estimate ${estimate.revision}`} className="space-y-5">
      {state.theirs && (
        <Alert tone="error" title="Someone else saved this draft while you were editing it.">
          <p>Your changes are still here. Save them over theirs, or load their version and lose yours.</p>
          <div className="mt-3 flex flex-wrap gap-2">
            <Button size="sm" onClick={state.keepMine}>Keep mine to save over theirs</Button>
            <Button size="sm" variant="secondary" onClick={() => (update.reset(), state.takeTheirs())}>Load their version</Button>
          </div>
        </Alert>
      )}
      {!state.theirs && <FormError error={update.error ?? issue.error} except={['validation_failed', 'version_conflict']} />}
      {general.length > 0 && (
        <Alert tone="error" title="Some details need fixing.">
          <ul className="list-disc pl-5">{general.map((message) => <li key={message}>{message}</li>)}</ul>
        </Alert>
      )}
      <DraftHeading draft={draft} errorFor={form.errorFor} onChange={(changes) => edit((d) => ({ ...d, ...changes }))} />
      <section aria-label="Included in every version" className="space-y-2">
        <h4 className="font-semibold">Included in every version</h4>
        <LineGroup {...ctx} {...lineHandlers} allLines={draft.lines} optionKey={null} groupName="every version" />
      </section>
      {choicesOf(draft.options).map((c) => (
        <ChoiceEditor
          key={c.options[0]!.key}
          {...ctx}
          choice={c.choice}
          choiceOptions={c.options}
          allLines={draft.lines}
          amounts={figures.lineAmounts}
          optionNets={figures.optionNets}
          onRenameChoice={(to) => edit((d) => renameChoice(d, c.choice, to))}
          onRenameOption={(key, name) => edit((d) => renameOption(d, key, name))}
          onAddOption={() => edit((d) => addOption(d, c.choice))}
          onRemoveOption={(key) => edit((d) => removeOption(d, key))}
          onChangeLine={lineHandlers.onChange}
          onRemoveLine={lineHandlers.onRemove}
          onAddLine={lineHandlers.onAdd}
        />
      ))}
      <Button variant="secondary" onClick={() => edit(addChoice)}>
        Add a choice for the client
      </Button>
      <TotalsPanel totals={figures.totals} currency={currency} taxRateBasisPoints={taxRate} options={draft.options} chosenKeys={chosen} onPreview={(key) => setPreview((p) => [...p.filter((k) => k !== key), key])} unreadableCount={figures.unreadableCount} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="secondary" isPending={update.isPending && !issue.isPending} disabled={!state.isDirty}>
          Save draft
        </Button>
        <Button onClick={() => setConfirmingIssue(true)} disabled={draft.lines.length === 0} isPending={issue.isPending}>
          Issue estimate
        </Button>
        {state.isDirty && <p className="self-center text-sm text-graphite-600" role="status">Unsaved changes</p>}
      </div>
      <ConfirmDialog
        isOpen={isConfirmingIssue}
        title={`Issue estimate ${estimate.revision}?`}
        confirmLabel="Issue estimate"
        isDestructive={false}
        isPending={update.isPending || issue.isPending}
        onConfirm={issueNow}
        onCancel={() => setConfirmingIssue(false)}
      >
        <p>Once issued it is frozen: changes after that need a new revision. {state.isDirty && 'Your unsaved changes are saved first.'}</p>
      </ConfirmDialog>
    </form>
  );
}
