import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MoveJobResult, type Board, type Job } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { errorReference } from '@/lib/error-messages';
import { showToast } from '@/lib/toast';
import { applyMove, replaceJob } from '../lib/apply-move';
import { moveErrorMessage } from '../lib/move-error';
import { boardKeys } from './keys';

export interface MoveJobVariables {
  job: Job;
  toStageId: string;
  /** Place among the target stage's other jobs (see `serverIndexFor`). */
  index: number;
}

export const moveJob = ({ job, toStageId, index }: MoveJobVariables) =>
  api.post(`/jobs/${encodeURIComponent(job.id)}/move`, { stageId: toStageId, index, version: job.version }, MoveJobResult);

/**
 * Moves a card at once on every cached board, puts every board back and says why if the server
 * refuses, and settles with one refetch of the board.
 */
export function useMoveJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: boardKeys.moves(),
    mutationFn: moveJob,
    meta: { handlesError: true },
    onMutate: async ({ job, toStageId, index }) => {
      await queryClient.cancelQueries({ queryKey: boardKeys.lists() });
      const snapshot = queryClient.getQueriesData<Board>({ queryKey: boardKeys.lists() });
      queryClient.setQueriesData<Board>({ queryKey: boardKeys.lists() }, (board) => board && applyMove(board, { jobId: job.id, toStageId, index }));
      return { snapshot };
    },
    onSuccess: ({ job }) => {
      // The new version lets a second move of the same card go through before the refetch lands.
      queryClient.setQueriesData<Board>({ queryKey: boardKeys.lists() }, (board) => board && replaceJob(board, job));
    },
    onError: (error, { job }, context) => {
      for (const [key, data] of context?.snapshot ?? []) queryClient.setQueryData(key, data);
      showToast('error', moveErrorMessage(error, job.title), errorReference(error));
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: boardKeys.all }),
  });
}
