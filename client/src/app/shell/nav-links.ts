import { Role, User } from '../core/auth';

/** Top-level destinations in the toolbar; features add theirs as they arrive. */
export interface NavLink {
  readonly path: string;
  readonly label: string;
  /** Active only on this exact URL (the overview), not on anything below it. */
  readonly exact?: boolean;
  /**
   * Who sees the link: everyone (the default), any signed-in reader, or holders of one of the
   * roles. It mirrors the route's guard; the API enforces the rule itself.
   */
  readonly access?: 'everyone' | 'signed-in' | readonly Role[];
}

export const NAV_LINKS: readonly NavLink[] = [
  { path: '/', label: 'Overview', exact: true },
  { path: '/search', label: 'Search' },
  { path: '/reactions', label: 'Reactions' },
  { path: '/proposals', label: 'Proposals', access: ['steward'] },
  { path: '/reviews', label: 'Reviews', access: ['reviewer'] },
  { path: '/releases', label: 'Releases', access: ['steward', 'reviewer', 'editor', 'admin'] },
  { path: '/sources', label: 'Sources', access: ['editor'] },
  { path: '/admin', label: 'Admin', access: ['admin'] },
  { path: '/account', label: 'Account', access: 'signed-in' },
];

/** The links `user` (null when signed out) may follow, in their order. */
export function visibleNavLinks(links: readonly NavLink[], user: User | null): NavLink[] {
  return links.filter((link) => {
    const access = link.access ?? 'everyone';
    if (access === 'everyone') {
      return true;
    }
    if (user === null) {
      return false;
    }
    return access === 'signed-in' || access.some((role) => user.roles.includes(role));
  });
}
