import type { ClientPage } from '@keybed/shared';
import { formatDate } from '@/lib/format';

/** The workshop's terms and how to reach them. */
export function WorkshopTerms({ workshop, expiresAt }: { workshop: ClientPage['workshop']; expiresAt: string }) {
  const contact = [workshop.phone, workshop.email].filter(Boolean);
  return (
    <section aria-labelledby="terms-heading" className="space-y-3">
      <h2 id="terms-heading" className="text-xl font-bold">Terms</h2>
      {workshop.terms ? (
        <div className="max-h-96 overflow-y-auto rounded-lg border border-graphite-300 bg-white p-4 whitespace-pre-line" tabIndex={0} aria-label="The workshop’s terms">
          {workshop.terms}
        </div>
      ) : (
        <p className="text-graphite-700">Ask {workshop.name} for their terms before you answer.</p>
      )}
      <div className="text-sm text-graphite-700">
        <p className="font-semibold">{workshop.name}</p>
        {workshop.address && <p className="whitespace-pre-line">{workshop.address}</p>}
        {contact.length > 0 && <p>{contact.join(' · ')}</p>}
        {workshop.vatNumber && <p>VAT number {workshop.vatNumber}</p>}
        <p className="mt-2">This link works until {formatDate(expiresAt)}.</p>
      </div>
    </section>
  );
}
