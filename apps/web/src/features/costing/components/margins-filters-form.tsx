import type { FieldErrors } from '@keybed/shared';
import { Field } from '@/components/field';
import { Select, type SelectOption } from '@/components/select';
import { TextInput } from '@/components/text-input';
import type { MarginsFilters } from '../api/keys';

interface MarginsFiltersFormProps {
  filters: MarginsFilters;
  /** Dates the report used when the URL gave none (the year so far). */
  period: { from: string; to: string } | undefined;
  problems: FieldErrors;
  statusOptions: readonly SelectOption[];
  onChange: (changes: Partial<Record<'from' | 'to' | 'status', string>>) => void;
}

/** The period and status, kept in the page's URL so a view can be shared or bookmarked. */
export function MarginsFiltersForm({ filters, period, problems, statusOptions, onChange }: MarginsFiltersFormProps) {
  return (
    <form role="search" aria-label="Margins filters" onSubmit={(e) => e.preventDefault()} className="flex flex-wrap items-start gap-4">
      <Field label="From" error={problems.from?.[0]} className="w-44">
        {(c) => <TextInput {...c} type="date" value={filters.from ?? period?.from ?? ''} onChange={(e) => onChange({ from: e.target.value })} />}
      </Field>
      <Field label="To" error={problems.to?.[0]} className="w-44">
        {(c) => <TextInput {...c} type="date" value={filters.to ?? period?.to ?? ''} onChange={(e) => onChange({ to: e.target.value })} />}
      </Field>
      <Field label="Status" error={problems.status?.[0]} className="w-44">
        {(c) => <Select {...c} options={[{ value: '', label: 'Any status' }, ...statusOptions]} value={filters.status ?? ''} onChange={(e) => onChange({ status: e.target.value })} />}
      </Field>
    </form>
  );
}
