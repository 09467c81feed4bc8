import { useNavigate, useParams } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { PageHeader } from '@/components/page-header';
import { Skeleton } from '@/components/skeleton';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { useTechnicians } from '@/features/bench/api/get-technicians';
import { usePiano } from '@/features/pianos/api/get-piano';
import { NewSurveyForm } from '@/features/surveys/components/new-survey-form';
import { pianoName } from '@/lib/piano';

/** Starts a condition survey of one piano; every member may survey. */
export function Component() {
  const { id = '' } = useParams();
  const me = useSignedInMember();
  const navigate = useNavigate();
  const piano = usePiano(id);
  const people = useTechnicians();

  if (piano.isPending) return <Skeleton className="h-96 w-full max-w-xl" />;
  if (piano.isError) return <ErrorState error={piano.error} onRetry={() => void piano.refetch()} isRetrying={piano.isFetching} />;
  const name = pianoName(piano.data);
  return (
    <>
      <title>{`Survey ${name} · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title={`Survey the ${name}`}
        description={`${piano.data.clientName}’s piano. The components come from the workshop’s ${piano.data.type === 'grand' ? 'grand' : 'upright'} template.`}
        actions={<ButtonLink to={paths.piano.build(id)} variant="secondary">Back to the piano</ButtonLink>}
      />
      <NewSurveyForm
        pianoId={id}
        meId={me.user.id}
        people={(people.data ?? []).map((p) => ({ id: p.id, name: p.name }))}
        onStarted={(survey) => void navigate(paths.survey.build(survey.id))}
      />
    </>
  );
}
