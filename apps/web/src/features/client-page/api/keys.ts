/** Query keys for the client's page, one per link token. */
export const clientPageKeys = {
  all: ['client-page'] as const,
  details: () => [...clientPageKeys.all, 'detail'] as const,
  detail: (token: string) => [...clientPageKeys.details(), token] as const,
};
