import type { ReactNode } from 'react';
import { isApiError } from '@/lib/api-client';
import { describeError, errorReference } from '@/lib/error-messages';
import { Alert } from './alert';

interface FormErrorProps {
  error: unknown;
  /** Codes this form already shows on its fields, so they are not said twice. */
  except?: readonly string[];
  /** Extra help under the message, e.g. a link to sign in. */
  children?: ReactNode;
}

/** The form-level part of a failed submit: what happened and what to do, by error code. */
export function FormError({ error, except = [], children }: FormErrorProps) {
  if (!error) return null;
  if (isApiError(error) && except.includes(error.code)) return null;
  const { title, action } = describeError(error);
  const reference = errorReference(error);
  return (
    <Alert tone="error" title={title}>
      <p>{action}</p>
      {reference && <p className="text-sm text-graphite-600">{reference}</p>}
      {children}
    </Alert>
  );
}
