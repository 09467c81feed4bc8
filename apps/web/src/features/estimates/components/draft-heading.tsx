import { Field } from '@/components/field';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import type { EstimateDraft } from '../lib/estimate-draft';

interface DraftHeadingProps {
  draft: EstimateDraft;
  errorFor: (name: string) => string | undefined;
  onChange: (changes: Partial<Pick<EstimateDraft, 'title' | 'notes'>>) => void;
}

/** The estimate's title and notes for the client. */
export function DraftHeading({ draft, errorFor, onChange }: DraftHeadingProps) {
  return (
    <div className="grid gap-4 md:grid-cols-2">
      <Field label="Estimate title" hint="What the client reads first" error={errorFor('title')}>
        {(c) => <TextInput {...c} value={draft.title} onChange={(e) => onChange({ title: e.target.value })} />}
      </Field>
      <Field label="Notes for the client" hint="Optional" error={errorFor('notes')}>
        {(c) => <Textarea {...c} rows={2} value={draft.notes} onChange={(e) => onChange({ notes: e.target.value })} />}
      </Field>
    </div>
  );
}
