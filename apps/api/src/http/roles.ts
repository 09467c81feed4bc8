/** Who runs the board: may change clients, pianos, stages and jobs. Technicians read them. */
export const BOARD_WRITERS = ['owner', 'foreman'] as const;
