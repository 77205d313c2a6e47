import { describe, expect, it } from 'vitest';
import { afterSignInPath, canOpen, homePathFor, navItems, navItemsFor } from '@/app/navigation';
import { paths } from '@/config/paths';
import { ROLES } from '@/lib/roles';

const labelsFor = (role: (typeof ROLES)[number]) => navItemsFor(role).map((item) => item.label);

describe('navigation by role', () => {
  it('shows Users to admin only', () => {
    expect(labelsFor('admin')).toEqual(['Today', 'Users']);
    expect(labelsFor('clerk')).toEqual(['Today']);
    expect(labelsFor('qa_lead')).toEqual(['Today']);
    expect(labelsFor('purchasing')).toEqual(['Today']);
  });

  it('never shows an item to a role it does not list', () => {
    for (const role of ROLES) {
      for (const item of navItemsFor(role)) expect(item.roles).toContain(role);
    }
  });

  it('has one entry per path', () => {
    const unique = new Set(navItems.map((item) => item.path));
    expect(unique.size).toBe(navItems.length);
  });

  it('guards known screens and their sub-paths, not unknown paths', () => {
    expect(canOpen('clerk', '/users')).toBe(false);
    expect(canOpen('clerk', '/users/42')).toBe(false);
    expect(canOpen('admin', '/users/42')).toBe(true);
    expect(canOpen('clerk', '/no-such-page')).toBe(true);
  });
});

describe('role home', () => {
  it('sends every role to a screen it may open', () => {
    for (const role of ROLES) expect(canOpen(role, homePathFor(role))).toBe(true);
  });

  it('sends purchasing to Today for now', () => {
    expect(homePathFor('purchasing')).toBe(paths.today.path);
    expect(homePathFor('clerk')).toBe(paths.today.path);
  });
});

describe('after sign-in', () => {
  it('returns to where the user was', () => {
    expect(afterSignInPath('admin', '/users?x=1')).toBe('/users?x=1');
  });

  it('goes home for missing, foreign, forbidden or sign-in targets', () => {
    expect(afterSignInPath('clerk', null)).toBe('/today');
    expect(afterSignInPath('clerk', '//evil.example/x')).toBe('/today');
    expect(afterSignInPath('clerk', 'https://evil.example')).toBe('/today');
    expect(afterSignInPath('clerk', '/users')).toBe('/today');
    expect(afterSignInPath('clerk', '/sign-in')).toBe('/today');
  });
});
