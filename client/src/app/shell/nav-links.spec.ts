import { User } from '../core/auth';
import { NAV_LINKS, NavLink, visibleNavLinks } from './nav-links';

describe('visibleNavLinks', () => {
  const links: NavLink[] = [
    { path: '/', label: 'Overview' },
    { path: '/account', label: 'Account', access: 'signed-in' },
    { path: '/reviews', label: 'Reviews', access: ['reviewer', 'editor'] },
    { path: '/admin', label: 'Users', access: ['admin'] },
  ];
  const reviewer: User = { id: 1, email: 'r@k.test', name: 'R', roles: ['reader', 'reviewer'] };

  it('shows only public links to a signed-out reader', () => {
    expect(visibleNavLinks(links, null).map((link) => link.label)).toEqual(['Overview']);
  });

  it('adds signed-in links and the links of the reader’s roles', () => {
    expect(visibleNavLinks(links, reviewer).map((link) => link.label)).toEqual(['Overview', 'Account', 'Reviews']);
  });

  it('offers search and reactions to everyone, the account only when signed in', () => {
    expect(visibleNavLinks(NAV_LINKS, null).map((link) => link.path)).toEqual(['/', '/search', '/reactions']);
    expect(visibleNavLinks(NAV_LINKS, reviewer).map((link) => link.path)).toContain('/account');
  });
});
