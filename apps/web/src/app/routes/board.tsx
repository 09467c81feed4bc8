import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { boardQueryOptions } from '@/features/board/api/get-board';
import { BoardScreen } from '@/features/board/components/board-screen';
import { filtersFromSearch } from '@/features/board/lib/board-filters';
import { CardHours, CardMargin } from '@/features/costing/components/card-indicators';
import { useCardMargins } from '@/features/costing/hooks/use-card-margins';
import { canRunBoard, canSeeCosts } from '@/lib/roles';
import type { LayoutHandle } from './app-layout';

export const handle: LayoutHandle = { isWide: true };

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(boardQueryOptions(filtersFromSearch(new URL(request.url).searchParams)));
    return null;
  };

export function Component() {
  const me = useSignedInMember();
  const canRun = canRunBoard(me.role);
  const margins = useCardMargins(canSeeCosts(me.role));
  return (
    <>
      <title>{`Board · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Board"
        description={
          canRun
            ? 'Drag a card to move a job, or use its handle: space to pick up, arrow keys to move, space to put down.'
            : 'Every job in the workshop, stage by stage. The owner and foreman move the cards.'
        }
        actions={canRun ? <ButtonLink to={paths.newJob.build()}>New job</ButtonLink> : undefined}
      />
      <BoardScreen
        canRunBoard={canRun}
        cardExtras={(job) => {
          const margin = margins.get(job.id);
          return (
            <>
              <CardHours hours={job.hours} />
              {margin && <CardMargin figures={margin} />}
            </>
          );
        }}
      />
    </>
  );
}
