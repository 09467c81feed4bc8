import { Checkbox } from '@/components/checkbox';

export interface Person {
  id: string;
  name: string;
}

interface AssigneePickerProps {
  people: readonly Person[];
  selected: readonly string[];
  onChange: (ids: string[]) => void;
  error?: string | undefined;
}

/** Who works on the task: any active member, technicians first (the API's order). */
export function AssigneePicker({ people, selected, onChange, error }: AssigneePickerProps) {
  const toggle = (id: string, isOn: boolean) => onChange(isOn ? [...selected, id] : selected.filter((x) => x !== id));
  return (
    <fieldset aria-invalid={error ? true : undefined}>
      <legend className="mb-1 font-semibold">Assigned to</legend>
      {people.length === 0 ? (
        <p className="text-graphite-600">Nobody to assign yet.</p>
      ) : (
        <div className="flex flex-wrap gap-x-5">
          {people.map((person) => (
            <Checkbox key={person.id} label={person.name} checked={selected.includes(person.id)} onChange={(e) => toggle(person.id, e.target.checked)} />
          ))}
        </div>
      )}
      {error && <p className="mt-1 text-sm font-semibold text-damper">{error}</p>}
    </fieldset>
  );
}
