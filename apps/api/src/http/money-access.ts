import type { Role } from '@keybed/shared';

/*
 * Who sees which money. The owner sees everything; the foreman sees prices (what the client pays:
 * charge-out rate, sell prices, estimate totals) but no costs, cost rates or margins; technicians
 * see no money at all. Services build responses without the fields a role may not see, so they are
 * absent on the wire, never merely hidden by the client.
 */

/** Costs, cost rates, markups and margins. */
export const seesCosts = (role: Role) => role === 'owner';

/** Prices the client pays. */
export const seesPrices = (role: Role) => role !== 'technician';
