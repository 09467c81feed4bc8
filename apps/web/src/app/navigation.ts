import type { Role } from '@keybed/shared';
import { paths } from '@/config/paths';
import { canManageTeam, canRunBoard, canSuperviseBench } from '@/lib/roles';

export interface NavItem {
  label: string;
  to: string;
  /** Match the path exactly (for Home), not as a prefix. */
  isExact?: boolean;
  isAllowed: (role: Role) => boolean;
}

const everyone = () => true;

/**
 * The signed-in navigation, in order. Parts, Estimates, Margins and Surveys join here as their
 * pages arrive; each item says which roles may use it.
 */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Home', to: paths.home.build(), isExact: true, isAllowed: everyone },
  { label: 'Board', to: paths.board.build(), isAllowed: everyone },
  { label: 'Clients', to: paths.clients.build(), isAllowed: everyone },
  { label: 'Timesheets', to: paths.timesheets.build(), isAllowed: everyone },
  { label: 'Stages', to: paths.stagesSettings.build(), isAllowed: canRunBoard },
  { label: 'Wall screen', to: paths.wallScreensSettings.build(), isAllowed: canSuperviseBench },
  { label: 'Team', to: paths.team.build(), isAllowed: canManageTeam },
];

export const navItemsFor = (role: Role) => NAV_ITEMS.filter((item) => item.isAllowed(role));
