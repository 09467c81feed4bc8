import { useState } from 'react';
import { ClientAcceptInput } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { isApiError } from '@/lib/api-client';
import { describeError } from '@/lib/error-messages';
import { useAcceptEstimate, useDeclineEstimate } from '../api/answer-estimate';

interface AnswerPanelProps {
  token: string;
  optionIds: string[];
  workshopName: string;
}

/** The client's own words for a refusal are the clearest (already accepted, replaced); others by code. */
function problemText(error: unknown): string {
  if (isApiError(error) && ['estimate_status', 'link_superseded', 'link_expired', 'link_revoked', 'conflict'].includes(error.code)) return error.message;
  const { title, action } = describeError(error);
  return `${title} ${action}`;
}

/** Accept by typing a name, or decline with an optional reason. */
export function AnswerPanel({ token, optionIds, workshopName }: AnswerPanelProps) {
  const accept = useAcceptEstimate(token);
  const decline = useDeclineEstimate(token);
  const [name, setName] = useState('');
  const [nameError, setNameError] = useState<string | undefined>();
  const [isDeclining, setIsDeclining] = useState(false);
  const [reason, setReason] = useState('');
  const error = accept.error ?? decline.error;

  return (
    <div className="space-y-4">
      {error && <Alert tone="error" title="Your answer was not recorded.">{problemText(error)}</Alert>}
      {!isDeclining ? (
        <form
          noValidate
          className="space-y-3"
          onSubmit={(e) => {
            e.preventDefault();
            const parsed = ClientAcceptInput.safeParse({ optionIds, name });
            if (!parsed.success) return setNameError(parsed.error.issues.find((i) => i.path[0] === 'name')?.message ?? 'Type your full name');
            setNameError(undefined);
            accept.mutate(parsed.data, { onError: (err) => isApiError(err) && err.fields?.name && setNameError(err.fields.name[0]) });
          }}
        >
          <Field label="Your full name" hint="Typing your name signs your acceptance" error={nameError}>
            {(control) => <TextInput {...control} autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} />}
          </Field>
          <p className="text-sm text-graphite-700">By accepting you agree to the work and prices shown, with the options you picked, and to {workshopName}’s terms.</p>
          <Button type="submit" className="w-full" isPending={accept.isPending}>Accept this estimate</Button>
        </form>
      ) : (
        <form
          noValidate
          className="space-y-3"
          onSubmit={(e) => {
            e.preventDefault();
            decline.mutate(reason.trim() ? { reason: reason.trim() } : {});
          }}
        >
          <Field label="Reason (optional)" hint="It helps the workshop, but you need not give one">
            {(control) => <Textarea {...control} rows={3} value={reason} onChange={(e) => setReason(e.target.value)} />}
          </Field>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="danger" isPending={decline.isPending}>Decline this estimate</Button>
            <Button variant="secondary" onClick={() => setIsDeclining(false)} disabled={decline.isPending}>Back</Button>
          </div>
        </form>
      )}
      {!isDeclining && (
        <Button variant="secondary" className="w-full" onClick={() => setIsDeclining(true)}>Decline</Button>
      )}
    </div>
  );
}
