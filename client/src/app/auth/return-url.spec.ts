import { safeReturnUrl } from './return-url';

describe('safeReturnUrl', () => {
  it('keeps a path inside the app, with its query', () => {
    expect(safeReturnUrl('/account?tab=keys')).toBe('/account?tab=keys');
  });

  it('falls back to the overview for anything else', () => {
    for (const unsafe of [null, undefined, '', 'https://evil.test/', '//evil.test', '/\\evil.test', 'account', '/sign-in?returnUrl=%2F']) {
      expect(safeReturnUrl(unsafe)).withContext(String(unsafe)).toBe('/');
    }
  });
});
