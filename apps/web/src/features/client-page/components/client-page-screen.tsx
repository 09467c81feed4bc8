import { useEffect, useMemo, useState } from 'react';
import type { ClientPage } from '@keybed/shared';
import { Button } from '@/components/button';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import { formatMinor } from '@/lib/money';
import { useClientPage } from '../api/get-client-page';
import { LINK_PROBLEM_TEXT, linkProblemOf } from '../lib/link-problem';
import { initialPicks, pickedIds, totalsFor, type Picks } from '../lib/option-totals';
import { AnswerPanel } from './answer-panel';
import { AnswerSummary } from './answer-summary';
import { CautionList } from './caution-list';
import { ClientPageFrame } from './client-page-frame';
import { DepositPanel } from './deposit-panel';
import { EstimateChoices } from './estimate-choices';
import { EstimateLines } from './estimate-lines';
import { PianoAndSurvey } from './piano-and-survey';
import { TotalsBox } from './totals-box';
import { WorkshopTerms } from './workshop-terms';

/** How long to keep asking whether the card payment has been recorded after coming back from it. */
const CONFIRM_FOR_MS = 60_000;

interface ClientPageScreenProps {
  token: string;
  returned: 'paid' | 'cancelled' | null;
}

/** The client's private page: the piano, what was found, the estimate to choose from, and the answer. */
export function ClientPageScreen({ token, returned }: ClientPageScreenProps) {
  const [waitStartedAt] = useState(() => Date.now());
  const [isWaitingTooLong, setIsWaitingTooLong] = useState(false);
  const [isWaiting, setIsWaiting] = useState(returned === 'paid');
  const page = useClientPage(token, { pollMs: isWaiting && !isWaitingTooLong ? 2_000 : false });
  const depositStatus = page.data?.deposit?.status;

  useEffect(() => {
    if (!isWaiting) return;
    if (depositStatus === 'paid') return setIsWaiting(false);
    const timer = setTimeout(() => setIsWaitingTooLong(true), Math.max(0, CONFIRM_FOR_MS - (Date.now() - waitStartedAt)));
    return () => clearTimeout(timer);
  }, [isWaiting, depositStatus, waitStartedAt]);

  if (page.isPending) {
    return (
      <ClientPageFrame workshopName={null}>
        <LoadingRegion label="Loading your estimate">
          <Skeleton className="h-10 w-2/3" />
          <Skeleton className="mt-6 h-64 w-full" />
        </LoadingRegion>
      </ClientPageFrame>
    );
  }
  if (page.isError) {
    const problem = linkProblemOf(page.error);
    const text = LINK_PROBLEM_TEXT[problem];
    return (
      <ClientPageFrame workshopName={null}>
        <title>{`${text.title} · Keybed`}</title>
        <div className="mx-auto max-w-xl space-y-4 py-8 text-center">
          <h1 className="text-2xl font-bold">{text.title}</h1>
          <p className="text-lg">{text.action}</p>
          {(problem === 'unreachable' || problem === 'other') && (
            <Button variant="secondary" onClick={() => void page.refetch()} isPending={page.isFetching}>Try again</Button>
          )}
        </div>
      </ClientPageFrame>
    );
  }
  return <LoadedPage token={token} page={page.data} returned={returned} isWaitingTooLong={isWaitingTooLong} />;
}

function LoadedPage({ token, page, returned, isWaitingTooLong }: { token: string; page: ClientPage; returned: 'paid' | 'cancelled' | null; isWaitingTooLong: boolean }) {
  const { estimate } = page;
  const isAnswered = page.response !== null || estimate.status !== 'issued';
  const [picks, setPicks] = useState<Picks>(() => initialPicks(estimate));
  const shownPicks = isAnswered ? initialPicks(estimate) : picks;
  const totals = useMemo(() => (isAnswered ? estimate.totals : totalsFor(estimate, shownPicks)), [isAnswered, estimate, shownPicks]);
  const pianoName = [page.piano.maker, page.piano.model].filter(Boolean).join(' ');

  return (
    <ClientPageFrame workshopName={page.workshop.name}>
      <title>{`Estimate for your ${pianoName} · ${page.workshop.name}`}</title>
      <meta name="robots" content="noindex" />
      <div className="mb-6">
        <h1 className="text-2xl font-bold sm:text-3xl">Estimate for your {pianoName}</h1>
        <p className="mt-1 text-graphite-700">
          For {page.client.name} · revision {estimate.revision}
          {estimate.title ? ` · ${estimate.title}` : ''}
        </p>
      </div>
      <div className="grid gap-8 lg:grid-cols-[1fr_24rem]">
        <div className="min-w-0 space-y-8">
          <PianoAndSurvey token={token} page={page} />
          <section aria-labelledby="estimate-heading" className="space-y-4">
            <h2 id="estimate-heading" className="text-xl font-bold">The estimate</h2>
            {estimate.notes && <p className="whitespace-pre-line">{estimate.notes}</p>}
            {estimate.includedLines.length > 0 && (
              <div className="rounded-lg border border-graphite-300 bg-white p-4">
                <h3 className="mb-2 font-semibold">Included in every case</h3>
                <EstimateLines lines={estimate.includedLines} currency={estimate.currency} label="Work included in every case" />
              </div>
            )}
            <EstimateChoices estimate={estimate} picks={shownPicks} isLocked={isAnswered} onPick={(choice, id) => setPicks((p) => ({ ...p, [choice]: id }))} />
            {/* On a phone the answer box comes after the terms; this keeps the total in sight while choosing. */}
            {!isAnswered && estimate.choices.length > 0 && (
              <p className="rounded-md bg-graphite-100 p-3 font-semibold tabular-figures lg:hidden">
                Total with your choices: {formatMinor(totals.grossMinor, estimate.currency)} with VAT
              </p>
            )}
          </section>
          <WorkshopTerms workshop={page.workshop} expiresAt={page.expiresAt} />
          <section aria-labelledby="cautions-heading" className="space-y-2">
            <h2 id="cautions-heading" className="text-xl font-bold">Good to know</h2>
            <CautionList cautions={page.cautions} />
          </section>
        </div>
        <aside aria-labelledby="answer-heading" className="lg:sticky lg:top-4 lg:self-start">
          <div className="space-y-4 rounded-lg border-2 border-walnut bg-white p-4">
            <h2 id="answer-heading" className="text-xl font-bold">{isAnswered ? 'Your answer' : 'Your total and answer'}</h2>
            <TotalsBox totals={totals} currency={estimate.currency} taxRateBasisPoints={estimate.taxRateBasisPoints} isLive={!isAnswered} />
            {isAnswered ? (
              <AnswerSummary page={page} />
            ) : (
              <AnswerPanel token={token} optionIds={pickedIds(estimate, picks)} workshopName={page.workshop.name} />
            )}
            {page.deposit && estimate.status === 'accepted' && (
              <DepositPanel token={token} deposit={page.deposit} currency={estimate.currency} returned={returned} isWaitingTooLong={isWaitingTooLong} />
            )}
          </div>
        </aside>
      </div>
    </ClientPageFrame>
  );
}
