import { SAFETY_CAUTIONS } from '@keybed/shared';
import { CautionIcon } from '@/components/safety-caution';
import { PageHeader } from '@/components/page-header';

/** A short, calm explainer behind the safety cautions; it points to the rules, it does not replace them. */
export function Component() {
  return (
    <>
      <title>Safety in the workshop · Keybed</title>
      <PageHeader title="Safety in the workshop" description="A short orientation, not a risk assessment." />
      <div className="max-w-prose space-y-8">
        <p>
          Keybed shows a caution beside work that can hurt someone. Each one below says what the caution is about and where
          the facts come from. Rules differ from place to place: follow your local codes and licensed practice, and your
          workshop’s own risk assessments.
        </p>
        {SAFETY_CAUTIONS.map((caution) => (
          <section key={caution.id} id={caution.helpAnchor} aria-labelledby={`${caution.helpAnchor}-heading`} className="scroll-mt-6 space-y-3">
            <h2 id={`${caution.helpAnchor}-heading`} className="flex items-center gap-2 text-lg font-semibold">
              <CautionIcon className="size-5" />
              {caution.title}
            </h2>
            <p>{caution.sentence}</p>
            <ul className="list-disc space-y-1 pl-6">
              {caution.facts.map((fact) => (
                <li key={fact.text}>
                  {fact.text} <span className="text-graphite-600">Source: {fact.source}.</span>
                </li>
              ))}
            </ul>
            <p className="text-graphite-600">Follow your local codes and licensed practice.</p>
          </section>
        ))}
        <p className="text-sm text-graphite-600">
          Source labels such as [S14a] refer to Keybed’s list of trade sources; HSE L23, INDG143, HSG51 and HSG258 are
          guidance from the UK Health and Safety Executive.
        </p>
      </div>
    </>
  );
}
