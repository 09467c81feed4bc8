/**
 * Query keys for bench people: the workshop's technicians (with PIN state), who is on what now,
 * and the signed-in member's own PIN state.
 */
export const benchKeys = {
  all: ['bench'] as const,
  lists: () => [...benchKeys.all, 'list'] as const,
  technicians: () => [...benchKeys.lists(), 'technicians'] as const,
  running: () => [...benchKeys.lists(), 'running'] as const,
  details: () => [...benchKeys.all, 'detail'] as const,
  ownPin: () => [...benchKeys.details(), 'own-pin'] as const,
};
