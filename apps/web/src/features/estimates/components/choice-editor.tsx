import type { EstimateLineKind } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import { formatMinor } from '@/lib/money';
import type { LineDraft, OptionDraft } from '../lib/estimate-draft';
import type { LineEditorContext } from './line-editor';
import { LineGroup } from './line-group';

interface ChoiceEditorProps extends LineEditorContext {
  choice: string;
  choiceOptions: OptionDraft[];
  allLines: readonly LineDraft[];
  amounts: Map<string, number | null>;
  optionNets: Map<string, number>;
  onRenameChoice: (to: string) => void;
  onRenameOption: (key: string, name: string) => void;
  onAddOption: () => void;
  onRemoveOption: (key: string) => void;
  onChangeLine: (uid: string, changes: Partial<LineDraft>) => void;
  onRemoveLine: (uid: string) => void;
  onAddLine: (kind: EstimateLineKind, optionKey: string | null) => void;
}

/** One question for the client ("Hammers") and the options that answer it, each with its own lines. */
export function ChoiceEditor(props: ChoiceEditorProps) {
  const { choice, choiceOptions, allLines, amounts, optionNets, onRenameChoice, onRenameOption, onAddOption, onRemoveOption, onChangeLine, onRemoveLine, onAddLine, ...ctx } = props;
  const index = (key: string) => ctx.options.findIndex((o) => o.key === key);
  const first = choiceOptions[0];
  return (
    <fieldset className="space-y-4 rounded-lg border-2 border-spruce bg-spruce-light/40 p-4">
      <legend className="px-1 font-semibold">Client’s choice: {choice || 'unnamed'}</legend>
      <Field label="What the client chooses" hint="e.g. Hammers, Case" error={first ? ctx.errorFor(`options.${index(first.key)}.choice`) : undefined} className="max-w-sm">
        {(c) => <TextInput {...c} className="min-h-9 text-sm" value={choice} onChange={(e) => onRenameChoice(e.target.value)} />}
      </Field>
      {choiceOptions.map((option, i) => {
        const hasLines = allLines.some((l) => l.optionKey === option.key);
        const label = option.name.trim() || `option ${i + 1}`;
        return (
          <div key={option.key} role="group" aria-label={`Option: ${label}`} className="space-y-3 rounded-md border border-graphite-300 bg-paper p-3">
            <div className="flex flex-wrap items-end gap-3">
              <Field label="Option name" error={ctx.errorFor(`options.${index(option.key)}.name`)} className="min-w-56 flex-1">
                {(c) => <TextInput {...c} className="min-h-9 text-sm" placeholder="e.g. New hammers" value={option.name} onChange={(e) => onRenameOption(option.key, e.target.value)} />}
              </Field>
              <p className="pb-2 text-sm tabular-figures">
                Option total <strong>{formatMinor(optionNets.get(option.key) ?? 0, ctx.currency)}</strong> ex VAT
              </p>
              <Button size="sm" variant="quiet" disabled={hasLines} title={hasLines ? 'Move or remove its lines first' : undefined} aria-label={`Remove option ${label}`} onClick={() => onRemoveOption(option.key)}>
                Remove option
              </Button>
            </div>
            <LineGroup {...ctx} allLines={allLines} optionKey={option.key} groupName={label} amounts={amounts} onChange={onChangeLine} onRemove={onRemoveLine} onAdd={onAddLine} />
          </div>
        );
      })}
      <Button size="sm" variant="secondary" onClick={onAddOption}>
        Add another option to {choice || 'this choice'}
      </Button>
    </fieldset>
  );
}
