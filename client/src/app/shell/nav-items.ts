import type { ComponentType } from 'react';
import AdminPanelSettingsOutlined from '@mui/icons-material/AdminPanelSettingsOutlined';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import InsightsOutlined from '@mui/icons-material/InsightsOutlined';
import WorkspacePremiumOutlined from '@mui/icons-material/WorkspacePremiumOutlined';
import MoreHorizOutlined from '@mui/icons-material/MoreHorizOutlined';
import RateReviewOutlined from '@mui/icons-material/RateReviewOutlined';
import ReportProblemOutlined from '@mui/icons-material/ReportProblemOutlined';
import TodayOutlined from '@mui/icons-material/TodayOutlined';
import WavesOutlined from '@mui/icons-material/WavesOutlined';
import { matchPath } from 'react-router-dom';
import type { Role } from '@/features/auth/api/types';
import { canAdminister, canUseReviewDesk } from '@/features/auth/roles';
import { paths, type RouteName } from '../paths';

/** The desktop side drawer's width (the phone has the bottom bar instead). */
export const DRAWER_WIDTH = 248;

export interface NavItem {
  route: RouteName;
  label: string;
  Icon: ComponentType;
  /** Desktop-only items appear in the side drawer, not in the phone's bottom bar. */
  desktopOnly?: boolean;
  allowed?: (role: Role) => boolean;
}

export const navItems: readonly NavItem[] = [
  { route: 'today', label: 'Today', Icon: TodayOutlined },
  { route: 'checks', label: 'Checks', Icon: FactCheckOutlined },
  { route: 'trips', label: 'Trips', Icon: WavesOutlined },
  { route: 'defects', label: 'Defects', Icon: ReportProblemOutlined },
  { route: 'more', label: 'More', Icon: MoreHorizOutlined },
  { route: 'reviewDesk', label: 'Review desk', Icon: RateReviewOutlined, desktopOnly: true, allowed: canUseReviewDesk },
  { route: 'seasonReport', label: 'Season report', Icon: InsightsOutlined, desktopOnly: true, allowed: canUseReviewDesk },
  { route: 'crewAwards', label: 'Crew awards', Icon: WorkspacePremiumOutlined, desktopOnly: true, allowed: canUseReviewDesk },
  { route: 'admin', label: 'Admin', Icon: AdminPanelSettingsOutlined, desktopOnly: true, allowed: canAdminister },
];

export function itemsFor(role: Role, desktop: boolean): NavItem[] {
  return navItems.filter((item) => (desktop || !item.desktopOnly) && (item.allowed?.(role) ?? true));
}

/** The item whose page is showing; Today matches only its own path, the others their sub-pages. */
export function activeRoute(items: NavItem[], pathname: string): RouteName | null {
  const hit = items.find((item) => matchPath({ path: paths[item.route].path, end: item.route === 'today' }, pathname));
  return hit?.route ?? null;
}
