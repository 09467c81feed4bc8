/** Query keys for the team feature: members and pending invitations, each with the standard levels. */
const teamRoot = ['team'] as const;

function resourceKeys<R extends string>(resource: R) {
  const all = [...teamRoot, resource] as const;
  return {
    all,
    lists: () => [...all, 'list'] as const,
    /** No filters yet; the object keeps room for them without changing callers. */
    list: (filters: Record<string, string> = {}) => [...all, 'list', filters] as const,
    details: () => [...all, 'detail'] as const,
    detail: (id: string) => [...all, 'detail', id] as const,
  };
}

export const teamKeys = {
  all: teamRoot,
  members: resourceKeys('members'),
  invitations: resourceKeys('invitations'),
};
