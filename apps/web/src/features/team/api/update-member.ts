import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Member, type UpdateMemberInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { membersQueryOptions } from './get-members';
import { teamKeys } from './keys';

interface UpdateMemberVariables {
  memberId: string;
  changes: UpdateMemberInput;
}

export const updateMember = ({ memberId, changes }: UpdateMemberVariables) =>
  api.patch(`/team/members/${encodeURIComponent(memberId)}`, changes, Member);

/** Shows the change in the list at once, puts it back if the API refuses, then settles from the server. */
export function useUpdateMember() {
  const queryClient = useQueryClient();
  const listKey = membersQueryOptions().queryKey;
  return useMutation({
    mutationFn: updateMember,
    onMutate: async ({ memberId, changes }) => {
      await queryClient.cancelQueries({ queryKey: teamKeys.members.lists() });
      const previous = queryClient.getQueryData(listKey);
      queryClient.setQueryData(listKey, (members) =>
        members?.map((member) => (member.id === memberId ? { ...member, ...changes } : member)),
      );
      return { previous };
    },
    onError: (_error, _variables, context) => {
      if (context?.previous) queryClient.setQueryData(listKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.members.lists() }),
  });
}
