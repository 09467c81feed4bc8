import { formatLengthMm, type ClientPage } from '@keybed/shared';
import { GradeBadge } from '@/components/grade-mark';
import { formatDay } from '@/lib/format';
import { clientPhotoUrl } from '../api/get-client-page';

const TYPE = { grand: 'grand', upright: 'upright', square: 'square piano', other: 'piano' } as const;
const KEYTOPS = { ivory: 'ivory keytops', plastic: 'plastic keytops', other: 'keytops of another material', unknown: null } as const;

/** The piano as the workshop found it: its particulars, the overall condition and what needs work, with photos. */
export function PianoAndSurvey({ token, page }: { token: string; page: ClientPage }) {
  const { piano, survey } = page;
  const facts = [
    piano.yearApprox ? `c. ${piano.yearApprox}` : null,
    TYPE[piano.type],
    piano.sizeMm ? `${formatLengthMm(piano.sizeMm, 'ft-in')} (${formatLengthMm(piano.sizeMm, 'cm')})` : null,
    KEYTOPS[piano.keytopMaterial],
  ].filter(Boolean);
  return (
    <section aria-labelledby="piano-heading" className="space-y-4">
      <h2 id="piano-heading" className="text-xl font-bold">Your piano</h2>
      <p>{facts.join(' · ')}</p>
      {survey && (
        <div className="space-y-4">
          <p className="text-graphite-700">Assessed on {formatDay(survey.surveyedOn)}.</p>
          {survey.overallGrade && (
            <p>
              Overall: <GradeBadge grade={survey.overallGrade} />
            </p>
          )}
          {survey.overallCondition && <p className="whitespace-pre-line">{survey.overallCondition}</p>}
          {survey.recommendedWork && (
            <div>
              <h3 className="font-semibold">What we recommend</h3>
              <p className="whitespace-pre-line">{survey.recommendedWork}</p>
            </div>
          )}
          {survey.findings.length > 0 && (
            <div>
              <h3 className="font-semibold">What needs attention</h3>
              <ul className="mt-2 space-y-3">
                {survey.findings.map((f, i) => (
                  <li key={i} className="rounded-lg border border-graphite-300 bg-white p-3">
                    <p className="flex flex-wrap items-center gap-2">
                      <span className="font-semibold">{f.name}</span>
                      <GradeBadge grade={f.grade} />
                    </p>
                    {f.note && <p className="mt-1 text-graphite-700">{f.note}</p>}
                    {f.photoIds.length > 0 && (
                      <ul className="mt-2 flex flex-wrap gap-2" aria-label={`Photos of ${f.name}`}>
                        {f.photoIds.map((id, n) => (
                          <li key={id}>
                            <a href={clientPhotoUrl(token, id, 'web')} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-md border border-graphite-300">
                              <img src={clientPhotoUrl(token, id, 'thumb')} alt={`${f.name}, photo ${n + 1}`} width={160} height={120} loading="lazy" className="h-30 w-40 object-cover" />
                            </a>
                          </li>
                        ))}
                      </ul>
                    )}
                  </li>
                ))}
              </ul>
            </div>
          )}
        </div>
      )}
    </section>
  );
}
