import type { Estimate } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { formatDate } from '@/lib/format';
import { formatMinor } from '@/lib/money';
import { estimateName, STATUS_LABELS } from '../lib/estimate-labels';
import { EstimateEditor, type EstimateEditorProps } from './estimate-editor';
import { EstimateView } from './estimate-view';

const STATUS_TONES: Record<Estimate['status'], string> = {
  draft: 'border-graphite-400 bg-graphite-100 text-ink',
  issued: 'border-spruce-deep bg-spruce-light text-ink',
  accepted: 'border-felt bg-felt-light text-felt',
  declined: 'border-damper bg-damper-light text-damper',
  superseded: 'border-graphite-300 bg-white text-graphite-600',
};

interface EstimateCardProps extends Omit<EstimateEditorProps, 'estimate'> {
  estimate: Estimate;
  /** Owner and foreman edit drafts and record the client's answer. */
  canEdit: boolean;
}

/** One revision: its name, status and dates, then the editor (a draft) or the frozen lines. */
export function EstimateCard({ estimate, canEdit, ...editor }: EstimateCardProps) {
  const headingId = `estimate-${estimate.id}`;
  const dates = [
    estimate.issuedAt && `issued ${formatDate(estimate.issuedAt)}`,
    estimate.acceptedAt && `accepted ${formatDate(estimate.acceptedAt)}`,
    estimate.declinedAt && `declined ${formatDate(estimate.declinedAt)}`,
  ].filter(Boolean);
  return (
    <article aria-labelledby={headingId} className="space-y-4 rounded-lg border border-graphite-300 bg-graphite-100/50 p-4">
      <header className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h3 id={headingId} className="text-lg font-semibold">
          {estimateName(estimate)}
          {estimate.title && <span className="font-normal">: {estimate.title}</span>}
        </h3>
        <span className={cx('rounded-sm border px-1.5 text-sm font-semibold', STATUS_TONES[estimate.status])}>{STATUS_LABELS[estimate.status]}</span>
        {dates.length > 0 && <span className="text-sm text-graphite-600">{dates.join(' · ')}</span>}
        {estimate.totals && estimate.status !== 'draft' && (
          <span className="ml-auto text-sm tabular-figures">
            {formatMinor(estimate.totals.netMinor, estimate.currency)} ex VAT
          </span>
        )}
      </header>
      {estimate.status === 'draft' && canEdit ? <EstimateEditor estimate={estimate} {...editor} /> : <EstimateView estimate={estimate} canDecide={canEdit} />}
    </article>
  );
}
