import type { ClientPage } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { formatDateTime } from '@/lib/format';

/** After the answer: the receipt of an acceptance (who, when, which options), or the refusal. */
export function AnswerSummary({ page }: { page: ClientPage }) {
  const { response, estimate, workshop } = page;
  const contact = [workshop.phone, workshop.email].filter(Boolean).join(' or ');
  if (estimate.status === 'declined' || response?.answer === 'declined') {
    return (
      <Alert title={`You declined this estimate${response ? ` on ${formatDateTime(response.at)}` : ''}.`}>
        <p>If you change your mind, contact {workshop.name}{contact ? ` on ${contact}` : ''}.</p>
      </Alert>
    );
  }
  const chosen = estimate.choices.flatMap((c) => c.options.filter((o) => o.isChosen).map((o) => `${c.choice}: ${o.name}`));
  return (
    <div className="space-y-2">
      <Alert tone="success" title="Accepted. Thank you.">
        <p>
          {response ? `Signed “${response.name ?? ''}” on ${formatDateTime(response.at)}` : 'Accepted'}, revision {estimate.revision}. A receipt has been e-mailed to you.
        </p>
      </Alert>
      {chosen.length > 0 && (
        <div>
          <h3 className="font-semibold">Your options</h3>
          <ul className="list-disc pl-5">
            {chosen.map((c) => <li key={c}>{c}</li>)}
          </ul>
        </div>
      )}
    </div>
  );
}
