import { ESTIMATE_LINE_KINDS, type EstimateLineKind } from '@keybed/shared';
import { Button } from '@/components/button';
import type { LineDraft } from '../lib/estimate-draft';
import { LineEditor, type LineEditorContext } from './line-editor';

interface LineGroupProps extends LineEditorContext {
  /** Every line of the estimate: numbering and errors follow the whole list. */
  allLines: readonly LineDraft[];
  optionKey: string | null;
  /** Names the group in the add buttons ("to New hammers"). */
  groupName: string;
  amounts: Map<string, number | null>;
  onChange: (uid: string, changes: Partial<LineDraft>) => void;
  onRemove: (uid: string) => void;
  onAdd: (kind: EstimateLineKind, optionKey: string | null) => void;
}

/** Each group's add buttons share these names; the group (a named region or option) tells them apart. */
const ADD_LABELS: Record<EstimateLineKind, string> = { labour: 'Add labour', part: 'Add a part', sublet: 'Add sublet work', other: 'Add another cost' };

/** The lines of one group (always included, or one option) and buttons to add more. */
export function LineGroup({ allLines, optionKey, groupName, amounts, onChange, onRemove, onAdd, ...ctx }: LineGroupProps) {
  const lines = allLines.flatMap((line, index) => (line.optionKey === optionKey ? [{ line, number: index + 1 }] : []));
  return (
    <div className="space-y-2">
      {lines.length === 0 && <p className="text-sm text-graphite-600">No lines here yet.</p>}
      {lines.map(({ line, number }) => (
        <LineEditor
          key={line.uid}
          line={line}
          number={number}
          amountMinor={amounts.get(line.uid) ?? null}
          onChange={(changes) => onChange(line.uid, changes)}
          onRemove={() => onRemove(line.uid)}
          {...ctx}
        />
      ))}
      <div className="flex flex-wrap items-center gap-2">
        {ESTIMATE_LINE_KINDS.map((kind) => (
          <Button key={kind} size="sm" variant="secondary" title={`Add a line to ${groupName}`} onClick={() => onAdd(kind, optionKey)}>
            {ADD_LABELS[kind]}
          </Button>
        ))}
      </div>
    </div>
  );
}
