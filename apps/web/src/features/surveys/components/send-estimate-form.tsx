import { useState } from 'react';
import { SendEstimateInput, type Estimate } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { formatDate } from '@/lib/format';
import { validateForm } from '@/lib/form';
import { useFormErrors } from '@/lib/use-form-errors';
import { useSendEstimate } from '../api/send-estimate';

interface SendEstimateFormProps {
  estimate: Estimate;
  clientName: string;
}

/** Issues a draft (freezing it) and e-mails the client their private link with the PDF attached. */
export function SendEstimateForm({ estimate, clientName }: SendEstimateFormProps) {
  const send = useSendEstimate();
  const { formRef, errorFor, showFields, showApiFields, clearField } = useFormErrors();
  const [to, setTo] = useState('');
  const [message, setMessage] = useState('');
  const isDraft = estimate.status === 'draft';

  if (send.data) {
    return (
      <Alert tone="success" title={`Sent to ${send.data.link.sentTo}.`}>
        <p>The link works until {formatDate(send.data.link.expiresAt)}. You will get an e-mail when {clientName} answers.</p>
      </Alert>
    );
  }
  return (
    <form
      ref={formRef}
      noValidate
      className="space-y-3"
      onSubmit={(event) => {
        event.preventDefault();
        const result = validateForm(SendEstimateInput, { ...(to.trim() ? { to: to.trim() } : {}), message });
        if (result.fields) return showFields(result.fields);
        send.mutate({ estimateId: estimate.id, jobId: estimate.jobId, input: result.data }, { onError: showApiFields });
      }}
    >
      <p className="text-sm text-graphite-700">
        {isDraft ? 'Issuing freezes this revision. ' : ''}
        {clientName} gets an e-mail with the estimate as a PDF and a private link to choose options, accept and pay the deposit.
      </p>
      <FormError error={send.error} except={['validation_failed']} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Send to" hint="Leave empty to use the client’s e-mail" error={errorFor('to')}>
          {(control) => <TextInput {...control} type="email" autoComplete="off" value={to} onChange={(e) => { setTo(e.target.value); clearField('to'); }} />}
        </Field>
        <Field label="Message (optional)" error={errorFor('message')}>
          {(control) => <Textarea {...control} rows={2} value={message} onChange={(e) => setMessage(e.target.value)} />}
        </Field>
      </div>
      <Button type="submit" isPending={send.isPending}>
        {isDraft ? 'Issue and send to the client' : 'Send to the client again'}
      </Button>
    </form>
  );
}
