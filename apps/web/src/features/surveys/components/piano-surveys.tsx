import { SURVEY_GRADE_LABELS } from '@keybed/shared';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Skeleton } from '@/components/skeleton';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { formatDay } from '@/lib/format';
import { usePianoSurveys } from '../api/get-piano-surveys';

/** A piano's condition surveys, newest first, with how far each got. */
export function PianoSurveys({ pianoId }: { pianoId: string }) {
  const surveys = usePianoSurveys(pianoId);
  if (surveys.isPending) return <Skeleton className="h-24 w-full" />;
  if (surveys.isError) return <ErrorState error={surveys.error} headingLevel="h3" onRetry={() => void surveys.refetch()} isRetrying={surveys.isFetching} />;
  if (surveys.data.length === 0) {
    return (
      <EmptyState title="No surveys yet" headingLevel="h3">
        <p>A survey records the piano’s condition part by part, with photos; the estimate is prepared from it.</p>
      </EmptyState>
    );
  }
  return (
    <ul aria-label="Surveys of this piano" className="divide-y divide-graphite-200 rounded-lg border border-graphite-300 bg-white">
      {surveys.data.map((s) => (
        <li key={s.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3">
          <TextLink to={paths.survey.build(s.id)}>Survey of {formatDay(s.surveyedOn)}</TextLink>
          <span className="text-sm text-graphite-600">
            {s.assessor ? `${s.assessor.name} · ` : ''}
            <span className="tabular-figures">{s.answeredCount} of {s.componentCount}</span> done
            {s.overallGrade ? ` · ${SURVEY_GRADE_LABELS[s.overallGrade]}` : ''}
            {s.isFinished ? ' · finished' : ''}
          </span>
        </li>
      ))}
    </ul>
  );
}
