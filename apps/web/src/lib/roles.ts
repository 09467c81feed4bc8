import type { Role } from '@keybed/shared';

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  foreman: 'Foreman',
  technician: 'Technician',
};

export const ROLE_OPTIONS = (Object.keys(ROLE_LABELS) as Role[]).map((role) => ({ value: role, label: ROLE_LABELS[role] }));

/** Only owners manage members and invitations; the API enforces the same rule. */
export function canManageTeam(role: Role): boolean {
  return role === 'owner';
}

/** Owners and foremen run the board: move cards, edit jobs, clients, pianos and stages. Technicians read. */
export function canRunBoard(role: Role): boolean {
  return role === 'owner' || role === 'foreman';
}

/** Owners and foremen pair wall screens, unlock PINs, correct time entries and approve weeks. */
export function canSuperviseBench(role: Role): boolean {
  return role === 'owner' || role === 'foreman';
}

/** Only owners set someone else's PIN; the API enforces the same rule. */
export function canSetMemberPins(role: Role): boolean {
  return role === 'owner';
}

/** Owners and foremen see prices (estimates, sell prices, the charge-out rate); the API leaves them out for technicians. */
export function canSeePrices(role: Role): boolean {
  return role === 'owner' || role === 'foreman';
}

/** Only owners see costs, cost rates and margins; the API leaves them out for everyone else. */
export function canSeeCosts(role: Role): boolean {
  return role === 'owner';
}
