/** Query keys for workshop settings and each member's cost rates. */
export const settingsKeys = {
  all: ['settings'] as const,
  details: () => [...settingsKeys.all, 'detail'] as const,
  workshop: () => [...settingsKeys.details(), 'workshop'] as const,
  costRates: (membershipId: string) => [...settingsKeys.details(), 'cost-rates', membershipId] as const,
};
