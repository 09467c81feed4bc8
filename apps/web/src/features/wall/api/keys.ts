/** Query keys for the wall screen: its own pairing, the people on it, the parts to log, and (for owners) paired screens. */
export const wallKeys = {
  all: ['wall'] as const,
  session: () => [...wallKeys.all, 'session'] as const,
  lists: () => [...wallKeys.all, 'list'] as const,
  technicians: () => [...wallKeys.lists(), 'technicians'] as const,
  devices: () => [...wallKeys.lists(), 'devices'] as const,
  parts: () => [...wallKeys.lists(), 'parts'] as const,
};
