import { describe, expect, it } from 'vitest';
import { afterSignInPath, canOpen, homePathFor, navItems, navItemsFor } from '@/app/navigation';
import { paths } from '@/config/paths';
import { ROLES } from '@/lib/roles';

const labelsFor = (role: (typeof ROLES)[number]) => navItemsFor(role).map((item) => item.label);

describe('navigation by role', () => {
  it('shows Users to admin only, and admin everything', () => {
    expect(labelsFor('admin')).toEqual(navItems.map((item) => item.label));
    expect(labelsFor('admin')).toContain('Users');
    for (const role of ROLES.filter((r) => r !== 'admin')) {
      expect(labelsFor(role)).not.toContain('Users');
      expect(labelsFor(role)).toContain('Today');
    }
  });

  it('lists exactly the items whose roles include the role, in order', () => {
    for (const role of ROLES) {
      const expected = navItems.filter((item) => item.roles.includes(role)).map((i) => i.label);
      expect(labelsFor(role)).toEqual(expected);
    }
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

  it('sends every role to Today, purchasing included (its queue of rejected lots is there)', () => {
    for (const role of ROLES) expect(homePathFor(role)).toBe(paths.today.path);
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
