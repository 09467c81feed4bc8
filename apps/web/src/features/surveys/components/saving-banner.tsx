import { Alert } from '@/components/alert';
import { useQueueSummary, type SurveySaving } from '../hooks/use-survey-saving';

/** One line for the whole survey: all saved, or how much waits on this device and why. */
export function SavingBanner({ saving, isOfflineCopy }: { saving: SurveySaving; isOfflineCopy: boolean }) {
  const components = useQueueSummary(saving.components);
  const fields = useQueueSummary(saving.fields);
  const unsent = components.unsentCount + fields.unsentCount;
  const conflicts = components.conflictCount + fields.conflictCount;
  const isDurable = components.isDurable && fields.isDurable;
  return (
    <div className="space-y-2">
      {isOfflineCopy && (
        <Alert title="You are working from the copy kept on this tablet.">
          <p>Keybed cannot be reached just now. Carry on: your answers are kept here and sent when the connection is back.</p>
        </Alert>
      )}
      {(components.isSignedOut || fields.isSignedOut) && (
        <Alert tone="error" title="You are signed out.">
          <p>Your answers are kept on this tablet. Sign in again in another tab, and they will be sent.</p>
        </Alert>
      )}
      {!isDurable && unsent > 0 && (
        <Alert tone="error" title="This browser will not keep unsent answers.">
          <p>Keep this page open until every answer shows “Saved”.</p>
        </Alert>
      )}
      <p className="text-sm font-semibold text-graphite-700">
        {unsent === 0
          ? 'Every answer is saved.'
          : `${unsent} ${unsent === 1 ? 'answer is' : 'answers are'} not saved yet and kept on this device${conflicts > 0 ? `; ${conflicts} ${conflicts === 1 ? 'needs' : 'need'} your decision` : ''}.`}
      </p>
    </div>
  );
}
