import { useMemo, useState } from 'react';
import { formatHoursMinutes, type EstimateProposal, type FieldErrors, type SurveyEstimateResult } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { isApiError } from '@/lib/api-client';
import { useCreateSurveyEstimate } from '../api/create-survey-estimate';
import { blankLine, buildEstimateInput, initialItems, optionsFromChoices, tickedLabourMinutes, type DraftItem } from '../lib/estimate-proposal';
import { GradeBadge } from '@/components/grade-mark';
import { ProposalItem } from './proposal-item';

/** Refusals whose own words say best what to change (an unknown operation, work already agreed). */
const SPECIFIC = new Set(['validation_failed', 'estimate_status', 'conflict']);

interface ProposalFormProps {
  proposal: EstimateProposal;
  currency: string;
  onCreated: (result: SurveyEstimateResult) => void;
}

/** Catalogue work for every component graded Needs work or Replace: tick, edit, add, group into options. */
export function ProposalForm({ proposal, currency, onCreated }: ProposalFormProps) {
  const create = useCreateSurveyEstimate();
  const [items, setItems] = useState<DraftItem[]>(() => initialItems(proposal));
  const [text, setText] = useState({ title: '', notes: '' });
  const [problems, setProblems] = useState<{ fields: FieldErrors; list: string[] }>({ fields: {}, list: [] });
  const options = useMemo(() => optionsFromChoices(proposal.choices), [proposal.choices]);
  const operations = useMemo(() => new Map(proposal.components.flatMap((c) => c.operations.map((o) => [o.id, o] as const))), [proposal.components]);
  const nameOf = useMemo(() => new Map(proposal.components.map((c) => [c.componentId, c.name])), [proposal.components]);
  const setItem = (next: DraftItem) => setItems((list) => list.map((i) => (i.id === next.id ? next : i)));
  const added = items.filter((i) => i.operationId === null);

  function submit() {
    const result = buildEstimateInput(items, proposal.choices, text, currency);
    if (!result.ok) return setProblems({ fields: result.fields, list: result.problems });
    setProblems({ fields: {}, list: [] });
    create.mutate({ surveyId: proposal.surveyId, input: result.input }, { onSuccess: onCreated });
  }

  const itemProps = (item: DraftItem, componentId?: string) => ({
    item,
    operation: item.operationId ? operations.get(item.operationId) : undefined,
    options,
    currency,
    alsoFor: item.componentIds.filter((id) => id !== componentId).map((id) => nameOf.get(id) ?? ''),
    errorFor: (field: string) => problems.fields[`items.${item.id}.${field}`]?.[0],
    onChange: setItem,
  });

  return (
    <form noValidate className="space-y-6" onSubmit={(e) => (e.preventDefault(), submit())}>
      <section aria-labelledby="proposal-found-heading" className="space-y-3">
        <h2 id="proposal-found-heading" className="text-xl font-bold">Work for what was found</h2>
        {proposal.components.length === 0 && (
          <EmptyState title="Nothing was graded Needs work or Replace" headingLevel="h3">
            <p>Add the work below, or grade the components in the survey first.</p>
          </EmptyState>
        )}
        {proposal.components.map((component) => {
          const own = items.filter((i) => i.componentIds[0] === component.componentId);
          return (
            <section key={component.componentId} aria-label={component.name} className="space-y-2 rounded-lg border border-graphite-300 bg-graphite-100 p-4">
              <div className="flex flex-wrap items-center gap-3">
                <h3 className="text-lg font-semibold">{component.name}</h3>
                <GradeBadge grade={component.grade} />
                <span className="text-sm text-graphite-600">{component.area}</span>
              </div>
              {component.note && <p className="text-graphite-700">“{component.note}”</p>}
              {component.operations.length === 0 ? (
                <p className="text-sm text-graphite-600">No catalogue operation remedies this yet: add the work below.</p>
              ) : own.length === 0 ? (
                <p className="text-sm text-graphite-600">Covered by work listed under another component above.</p>
              ) : (
                <ul className="space-y-2">{own.map((item) => <ProposalItem key={item.id} {...itemProps(item, component.componentId)} />)}</ul>
              )}
            </section>
          );
        })}
      </section>

      <section aria-labelledby="proposal-added-heading" className="space-y-3">
        <h2 id="proposal-added-heading" className="text-xl font-bold">Other work</h2>
        {added.length > 0 && (
          <ul className="space-y-2">
            {added.map((item) => <ProposalItem key={item.id} {...itemProps(item)} onRemove={() => setItems((list) => list.filter((i) => i.id !== item.id))} />)}
          </ul>
        )}
        <Button
          variant="secondary"
          onClick={() => setItems((list) => [...list, { id: crypto.randomUUID(), operationId: null, name: `Added work ${added.length + 1}`, componentIds: [], isTicked: true, optionKey: '', lines: [blankLine('labour')] }])}
        >
          Add other work
        </Button>
      </section>

      <section aria-labelledby="proposal-text-heading" className="space-y-3">
        <h2 id="proposal-text-heading" className="text-xl font-bold">Title and notes</h2>
        <Field label="Title" hint="Left empty, the first line of the survey’s recommended work">
          {(control) => <TextInput {...control} value={text.title} onChange={(e) => setText({ ...text, title: e.target.value })} />}
        </Field>
        <Field label="Notes for the client">
          {(control) => <Textarea {...control} rows={3} value={text.notes} onChange={(e) => setText({ ...text, notes: e.target.value })} />}
        </Field>
      </section>

      <div className="space-y-3 border-t border-graphite-300 pt-4">
        <p className="text-graphite-700 tabular-figures">
          {items.filter((i) => i.isTicked).length} pieces of work ticked · {formatHoursMinutes(tickedLabourMinutes(items, operations))} h of labour
        </p>
        {(problems.list.length > 0 || Object.keys(problems.fields).length > 0) && (
          <Alert tone="error" title="Some of the work needs fixing.">
            <ul className="list-disc pl-5">
              {problems.list.map((p) => <li key={p}>{p}</li>)}
              {Object.keys(problems.fields).length > 0 && <li>Check the highlighted lines.</li>}
            </ul>
          </Alert>
        )}
        {isApiError(create.error) && SPECIFIC.has(create.error.code) ? (
          <Alert tone="error" title="The estimate was not created.">
            <p>{create.error.message}</p>
            {create.error.fields && (
              <ul className="list-disc pl-5">
                {[...new Set(Object.values(create.error.fields).flat())].map((m) => <li key={m}>{m}</li>)}
              </ul>
            )}
          </Alert>
        ) : (
          <FormError error={create.error} />
        )}
        <Button type="submit" isPending={create.isPending}>
          {proposal.jobId ? 'Create a new draft revision' : 'Create the draft estimate'}
        </Button>
      </div>
    </form>
  );
}
