import type { JobStatus, PianoDetail } from '@keybed/shared';
import { EmptyState } from '@/components/empty-state';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';

const STATUS_LABELS: Record<JobStatus, string> = { active: 'Active', on_hold: 'On hold', done: 'Done', cancelled: 'Cancelled', proposed: 'Proposed' };

/** Every job this piano has had, newest first. */
export function PianoJobs({ piano }: { piano: PianoDetail }) {
  if (piano.jobs.length === 0) {
    return (
      <EmptyState title="No jobs yet" headingLevel="h3">
        <p>Jobs on this piano appear here, from the first assessment on.</p>
      </EmptyState>
    );
  }
  return (
    <ul aria-label="Jobs on this piano" className="divide-y divide-graphite-200 rounded-lg border border-graphite-300 bg-white">
      {piano.jobs.map((job) => (
        <li key={job.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3">
          <TextLink to={paths.job.build(job.id)}>{job.title}</TextLink>
          <span className="text-sm text-graphite-600">
            {STATUS_LABELS[job.status]}
            {job.status === 'active' || job.status === 'on_hold' ? ` · ${job.stageName}` : ''} · started{' '}
            <span className="tabular-figures">{formatDate(job.createdAt)}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}
