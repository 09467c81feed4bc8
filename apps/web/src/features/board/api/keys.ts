/** The board's filters, as they appear in its URL. */
export interface BoardFilters {
  q?: string;
  blocked?: true;
  technicianId?: string;
}

/** Query keys for the board: one whole-board list per set of filters, and the move mutation. */
export const boardKeys = {
  all: ['board'] as const,
  lists: () => [...boardKeys.all, 'list'] as const,
  list: (filters: BoardFilters) => [...boardKeys.lists(), filters] as const,
  moves: () => [...boardKeys.all, 'move'] as const,
};
