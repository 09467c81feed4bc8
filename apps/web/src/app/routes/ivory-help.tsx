import { PageHeader } from '@/components/page-header';

/** A short, calm explainer behind the ivory caution; it points to the rules, it does not replace them. */
export function Component() {
  return (
    <>
      <title>Ivory keytops and the law · Keybed</title>
      <PageHeader title="Ivory keytops and the law" description="A short orientation, not legal advice." />
      <div className="max-w-prose space-y-4">
        <p>
          Many older pianos have keytops of elephant ivory. Restoring such a piano in the workshop is ordinary work; what
          needs care is selling it, hiring it out, or sending it to another country.
        </p>
        <h2 className="text-lg font-semibold">In the United Kingdom</h2>
        <p>
          The Ivory Act 2018 bans dealing in items containing elephant ivory, with narrow exemptions. Musical
          instruments made before 1975 with less than 20 % ivory by volume are one of them, but the instrument must be
          registered before it is sold or hired. Check the government’s guidance on ivory for the current rules.
        </p>
        <h2 className="text-lg font-semibold">Across borders</h2>
        <p>
          Moving ivory between countries falls under CITES, the Convention on International Trade in Endangered Species.
          An instrument with ivory usually needs permits to leave one country and enter the next, and some countries
          refuse ivory altogether.
        </p>
        <h2 className="text-lg font-semibold">Elsewhere</h2>
        <p>
          Other countries and states have their own rules, some stricter. Check with the authority where the piano is
          sold or sent before agreeing a sale or shipment.
        </p>
        <h2 className="text-lg font-semibold">Replacing ivory keytops</h2>
        <p>
          Removed keytops are still ivory, and selling them on their own is generally not allowed. Keep them with the
          piano, or ask the relevant authority what to do with them.
        </p>
      </div>
    </>
  );
}
