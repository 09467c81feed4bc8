import { queryOptions, useQuery } from '@tanstack/react-query';
import { Member } from '@keybed/shared';
import { api, field } from '@/lib/api-client';
import { teamKeys } from './keys';

export const getMembers = () => api.get('/team/members', field('members', Member.array()));

export const membersQueryOptions = () => queryOptions({ queryKey: teamKeys.members.list(), queryFn: getMembers });

export const useMembers = () => useQuery(membersQueryOptions());
