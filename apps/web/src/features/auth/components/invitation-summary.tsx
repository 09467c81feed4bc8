import type { InvitationPreview } from '@keybed/shared';
import { formatDateTime } from '@/lib/format';
import { ROLE_LABELS } from '@/lib/roles';

/** Who is invited, to which workshop, as what, and until when. */
export function InvitationSummary({ preview }: { preview: InvitationPreview }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md border border-graphite-300 bg-graphite-100 p-4">
      <dt className="text-graphite-600">Workshop</dt>
      <dd className="font-semibold">{preview.workshopName}</dd>
      <dt className="text-graphite-600">E-mail</dt>
      <dd className="break-all">{preview.email}</dd>
      <dt className="text-graphite-600">Role</dt>
      <dd>{ROLE_LABELS[preview.role]}</dd>
      <dt className="text-graphite-600">Expires</dt>
      <dd className="tabular-figures">{formatDateTime(preview.expiresAt)}</dd>
    </dl>
  );
}
