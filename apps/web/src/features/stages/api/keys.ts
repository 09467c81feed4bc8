/** Query keys for the workshop's stages. The list holds active and archived stages together. */
export const stageKeys = {
  all: ['stages'] as const,
  lists: () => [...stageKeys.all, 'list'] as const,
  list: () => [...stageKeys.lists(), {}] as const,
  details: () => [...stageKeys.all, 'detail'] as const,
  detail: (id: string) => [...stageKeys.details(), id] as const,
};
