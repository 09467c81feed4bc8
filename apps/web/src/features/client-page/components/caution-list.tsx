import type { Caution } from '@keybed/shared';

/** Each caution in one sentence of our own, and where to read the rules; unknown keys fall back to the API's words. */
const CAUTION_TEXT: Record<Caution['key'], { sentence: string; link: { href: string; label: string } }> = {
  ivory: {
    sentence: 'Restoring a piano with ivory keytops is ordinary work, but selling, hiring out or exporting it may need registration or a permit (in the UK the Ivory Act 2018; CITES for export), so check the rules where you are.',
    link: { href: 'https://www.gov.uk/guidance/declare-ivory-you-intend-to-sell-or-hire-out', label: 'Ivory rules on GOV.UK' },
  },
  moving: {
    sentence: 'Pianos are very heavy (an upright roughly 220–270 kg, a grand from about 230 kg to over 500 kg), so collection and delivery are done by trained piano movers with proper equipment; please do not move it yourself.',
    link: { href: 'https://www.hse.gov.uk/pubns/indg143.pdf', label: 'Safe handling of heavy loads (HSE)' },
  },
};

function CautionIcon() {
  return (
    <svg viewBox="0 0 20 20" aria-hidden="true" className="mt-0.5 size-5 shrink-0 text-walnut">
      <path d="M10 2.5 18 17H2z" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
      <rect x="9.2" y="7.5" width="1.6" height="5" rx="0.8" fill="currentColor" />
      <circle cx="10" cy="14.6" r="1" fill="currentColor" />
    </svg>
  );
}

/** Calm cautions where they matter: an icon, one sentence, a link to the rules. */
export function CautionList({ cautions }: { cautions: readonly Caution[] }) {
  if (cautions.length === 0) return null;
  return (
    <ul className="space-y-2">
      {cautions.map((caution) => {
        const own = CAUTION_TEXT[caution.key];
        return (
          <li key={caution.key}>
            <aside aria-label={caution.title} className="flex items-start gap-3 rounded-md border border-graphite-300 bg-spruce-light p-3">
              <CautionIcon />
              <p>
                <span className="font-semibold">{caution.title}.</span> {own?.sentence ?? caution.text}{' '}
                {own && (
                  <a href={own.link.href} target="_blank" rel="noreferrer" className="font-semibold text-walnut underline underline-offset-2">
                    {own.link.label}
                  </a>
                )}
              </p>
            </aside>
          </li>
        );
      })}
    </ul>
  );
}
