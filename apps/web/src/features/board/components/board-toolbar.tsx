import { useRef } from 'react';
import type { Board } from '@keybed/shared';
import { Checkbox } from '@/components/checkbox';
import { SearchField } from '@/components/search-field';
import { Select } from '@/components/select';
import type { BoardFilters } from '../api/keys';
import { hasFilters } from '../lib/board-filters';
import { LengthUnitToggle } from './length-unit-toggle';

interface BoardToolbarProps {
  filters: BoardFilters;
  board: Board | undefined;
  onChange: (changes: { q?: string; blocked?: boolean; technicianId?: string }) => void;
}

/**
 * Technicians seen on any card so far. The team list is for owners only, so the board offers
 * the technicians its own cards name, and keeps them while a filter hides their cards.
 */
function useSeenTechnicians(board: Board | undefined) {
  const seen = useRef(new Map<string, string>());
  for (const stage of board?.stages ?? []) for (const job of stage.jobs) for (const t of job.technicians) seen.current.set(t.id, t.name);
  return [...seen.current].map(([value, label]) => ({ value, label })).sort((a, b) => a.label.localeCompare(b.label));
}

/** Search, blocked-only and technician filters (kept in the URL), and the size unit. */
export function BoardToolbar({ filters, board, onChange }: BoardToolbarProps) {
  const technicians = useSeenTechnicians(board);
  const isTechnicianKnown = !filters.technicianId || technicians.some((t) => t.value === filters.technicianId);
  const technicianOptions = [
    { value: '', label: 'Everyone' },
    ...technicians,
    ...(isTechnicianKnown ? [] : [{ value: filters.technicianId!, label: 'The chosen technician' }]),
  ];

  return (
    <div role="search" aria-label="Filter the board" className="mb-4 flex flex-wrap items-end gap-x-4 gap-y-2">
      <SearchField
        label="Search jobs"
        placeholder="Client, piano or serial number"
        value={filters.q ?? ''}
        onSearch={(q) => onChange({ q })}
        isCompact
        className="w-full sm:w-72"
      />
      <Checkbox label="Blocked only" isCompact checked={filters.blocked === true} onChange={(e) => onChange({ blocked: e.target.checked })} />
      {technicianOptions.length > 1 && (
        <label className="text-sm font-semibold">
          Technician
          <Select
            isCompact
            options={technicianOptions}
            value={filters.technicianId ?? ''}
            onChange={(e) => onChange({ technicianId: e.target.value })}
            className="mt-1 w-48 font-normal"
          />
        </label>
      )}
      {hasFilters(filters) && (
        <button type="button" onClick={() => onChange({ q: '', blocked: false, technicianId: '' })} className="min-h-9 text-sm font-semibold text-walnut underline underline-offset-2">
          Clear filters
        </button>
      )}
      <div className="ml-auto">
        <LengthUnitToggle />
      </div>
    </div>
  );
}
