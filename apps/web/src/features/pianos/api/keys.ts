/** Query keys for pianos: lists (by client or search) and one piano with its job history per detail. */
export interface PianoFilters {
  clientId?: string;
  q?: string;
}

export const pianoKeys = {
  all: ['pianos'] as const,
  lists: () => [...pianoKeys.all, 'list'] as const,
  list: (filters: PianoFilters) => [...pianoKeys.lists(), filters] as const,
  details: () => [...pianoKeys.all, 'detail'] as const,
  detail: (id: string) => [...pianoKeys.details(), id] as const,
};
