import { describeError, errorReference } from '@/lib/error-messages';
import { cx } from '@/lib/cx';
import { Button } from './button';

interface ErrorStateProps {
  error: unknown;
  /** Offer a retry when asking again might help. */
  onRetry?: () => void;
  isRetrying?: boolean;
  headingLevel?: 'h2' | 'h3' | 'h4';
  className?: string;
}

/** A region that could not load: says what happened and what to do, from the API's error code. */
export function ErrorState({ error, onRetry, isRetrying, headingLevel: Heading = 'h2', className }: ErrorStateProps) {
  const { title, action } = describeError(error);
  const reference = errorReference(error);
  return (
    <div role="alert" className={cx('rounded-lg border border-damper bg-damper-light px-6 py-8 text-center', className)}>
      <Heading className="text-lg font-semibold">{title}</Heading>
      <p className="mx-auto mt-2 max-w-prose text-ink">{action}</p>
      {reference && <p className="mt-2 text-sm text-graphite-600">{reference}</p>}
      {onRetry && (
        <Button variant="secondary" className="mt-5" onClick={onRetry} isPending={isRetrying}>
          Try again
        </Button>
      )}
    </div>
  );
}
