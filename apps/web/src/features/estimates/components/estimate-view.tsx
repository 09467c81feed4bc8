import { useState } from 'react';
import { defaultOptionIds, type Estimate } from '@keybed/shared';
import { Button } from '@/components/button';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { FormError } from '@/components/form-error';
import { formatDate } from '@/lib/format';
import { showToast } from '@/lib/toast';
import { useAcceptEstimate } from '../api/accept-estimate';
import { useDeclineEstimate } from '../api/decline-estimate';
import { estimateName } from '../lib/estimate-labels';
import { AcceptDialog } from './accept-dialog';
import { EstimateLines } from './estimate-lines';
import { TotalsPanel } from './totals-panel';

/** An estimate that can no longer be edited: its lines and totals, and the client's answer to record. */
export function EstimateView({ estimate, canDecide }: { estimate: Estimate; canDecide: boolean }) {
  const accept = useAcceptEstimate(estimate.jobId);
  const decline = useDeclineEstimate(estimate.jobId);
  const [dialog, setDialog] = useState<'accept' | 'decline' | null>(null);
  const name = estimateName(estimate);
  const chosenIds = estimate.status === 'accepted' ? estimate.options.filter((o) => o.isChosen).map((o) => o.id) : defaultOptionIds(estimate.options);
  const chosenKeys = estimate.options.filter((o) => chosenIds.includes(o.id)).map((o) => o.key);

  return (
    <div className="space-y-4">
      {estimate.notes && <p className="max-w-prose whitespace-pre-line">{estimate.notes}</p>}
      <EstimateLines estimate={estimate} />
      {estimate.totals && (
        <div className="max-w-md">
          <TotalsPanel
            heading={estimate.status === 'accepted' ? 'Agreed totals' : estimate.options.length > 0 ? 'Totals with the first option of each choice' : 'Totals'}
            totals={estimate.totals}
            currency={estimate.currency}
            taxRateBasisPoints={estimate.taxRateBasisPoints ?? 0}
            options={estimate.options}
            chosenKeys={chosenKeys}
          />
        </div>
      )}
      {canDecide && estimate.status === 'issued' && (
        <div className="space-y-2">
          <FormError error={accept.error ?? decline.error} except={['validation_failed']} />
          <div className="flex flex-wrap gap-2">
            <Button onClick={() => setDialog('accept')}>Accept for the client</Button>
            <Button variant="secondary" onClick={() => setDialog('decline')}>Record a decline</Button>
          </div>
        </div>
      )}
      <AcceptDialog
        estimate={estimate}
        isOpen={dialog === 'accept'}
        isPending={accept.isPending}
        onCancel={() => setDialog(null)}
        onAccept={(optionIds) =>
          accept.mutate(
            { estimateId: estimate.id, input: { optionIds } },
            { onSuccess: () => showToast('success', `${name} accepted on ${formatDate(new Date().toISOString())}.`), onSettled: () => setDialog(null) },
          )
        }
      />
      <ConfirmDialog
        isOpen={dialog === 'decline'}
        title={`Record that the client declined ${name.toLowerCase()}?`}
        confirmLabel="Record a decline"
        isPending={decline.isPending}
        onCancel={() => setDialog(null)}
        onConfirm={() => decline.mutate({ estimateId: estimate.id }, { onSuccess: () => showToast('info', `${name} recorded as declined.`), onSettled: () => setDialog(null) })}
      >
        <p>It stays on the job as declined and can no longer be accepted. You can start a new revision from it.</p>
      </ConfirmDialog>
    </div>
  );
}
