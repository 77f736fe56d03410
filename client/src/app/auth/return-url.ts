/**
 * The address to go to after signing in: `returnUrl` when it is a path inside this app,
 * otherwise the overview. Refuses absolute and protocol-relative URLs (`//evil.test`), so a
 * crafted sign-in link cannot send the reader to another site.
 */
export function safeReturnUrl(returnUrl: string | null | undefined): string {
  if (!returnUrl || !returnUrl.startsWith('/') || returnUrl.startsWith('//') || returnUrl.startsWith('/\\')) {
    return '/';
  }
  if (returnUrl.startsWith('/sign-in')) {
    return '/';
  }
  return returnUrl;
}
