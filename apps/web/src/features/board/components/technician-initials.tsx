import type { Job } from '@keybed/shared';
import { initialsOf } from '../lib/initials';

/** Technicians with open tasks on the job, as initials; their full names are read out. */
export function TechnicianInitials({ technicians }: { technicians: Job['technicians'] }) {
  if (technicians.length === 0) return null;
  return (
    <ul aria-label="Technicians" className="flex gap-1">
      {technicians.map((t) => (
        <li key={t.id}>
          <abbr
            title={t.name}
            className="flex size-6 items-center justify-center rounded-full bg-graphite-200 text-xs font-bold text-ink no-underline"
          >
            <span aria-hidden="true">{initialsOf(t.name)}</span>
            <span className="sr-only">{t.name}</span>
          </abbr>
        </li>
      ))}
    </ul>
  );
}
