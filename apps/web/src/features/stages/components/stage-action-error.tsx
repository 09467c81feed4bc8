import { Alert } from '@/components/alert';
import { FormError } from '@/components/form-error';
import { isApiError } from '@/lib/api-client';

/**
 * A refused stage change. For a stage that still holds jobs, or the last active stage, the API's
 * own sentence names the stage and the count, so it is shown as it came.
 */
export function StageActionError({ error }: { error: unknown }) {
  if (!error) return null;
  if (isApiError(error) && (error.code === 'stage_not_empty' || error.code === 'conflict')) {
    return (
      <Alert tone="error" title="This stage cannot be archived yet.">
        <p>{error.message}</p>
      </Alert>
    );
  }
  return <FormError error={error} except={['validation_failed']} />;
}
