import { returnUrl } from './return-url';

describe('returnUrl', () => {
  it('keeps in-app paths with their query', () => {
    expect(returnUrl('/invitations/abc?x=1')).toBe('/invitations/abc?x=1');
  });

  it('refuses what would leave the app or loop back to sign-in', () => {
    for (const bad of [
      'https://evil.example/',
      '//evil.example',
      '/\\evil.example',
      'w/1',
      '/sign-in?returnUrl=/x',
    ]) {
      expect(returnUrl(bad)).toBe('/workspaces');
    }
    expect(returnUrl(undefined)).toBe('/workspaces');
  });
});
