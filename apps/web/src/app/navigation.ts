import type { ComponentType } from 'react';
import type { Role } from '@keybed/shared';
import { paths } from '@/config/paths';
import { LowStockNavCount } from '@/features/parts/components/low-stock-nav-count';
import { canManageTeam, canRunBoard, canSeeCosts, canSuperviseBench } from '@/lib/roles';

export interface NavItem {
  label: string;
  to: string;
  /** Match the path exactly (for Home), not as a prefix. */
  isExact?: boolean;
  isAllowed: (role: Role) => boolean;
  /** A small count beside the label (parts low on stock). */
  Badge?: ComponentType;
}

const everyone = () => true;

/**
 * The signed-in navigation, in order; each item says which roles may use it. Estimates live on
 * each job's page; Surveys join here when their pages arrive.
 */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Home', to: paths.home.build(), isExact: true, isAllowed: everyone },
  { label: 'Board', to: paths.board.build(), isAllowed: everyone },
  { label: 'Clients', to: paths.clients.build(), isAllowed: everyone },
  { label: 'Parts', to: paths.parts.build(), isAllowed: everyone, Badge: LowStockNavCount },
  { label: 'Timesheets', to: paths.timesheets.build(), isAllowed: everyone },
  { label: 'Margins', to: paths.margins.build(), isAllowed: canSeeCosts },
  { label: 'Catalogue', to: paths.catalogue.build(), isAllowed: canRunBoard },
  { label: 'Stages', to: paths.stagesSettings.build(), isAllowed: canRunBoard },
  { label: 'Wall screen', to: paths.wallScreensSettings.build(), isAllowed: canSuperviseBench },
  { label: 'Team', to: paths.team.build(), isAllowed: canManageTeam },
  { label: 'Settings', to: paths.workshopSettings.build(), isAllowed: canSeeCosts },
];

export const navItemsFor = (role: Role) => NAV_ITEMS.filter((item) => item.isAllowed(role));
