import { describe, expect, it } from 'vitest';
import { homeFor, navFor, redirectFor, ROUTES } from './routes';

describe('navigation by role', () => {
  it('sends each role to its own start', () => {
    expect(homeFor('inspector')).toBe('/presses');
    expect(homeFor('supervisor')).toBe('/review');
    expect(homeFor('quality')).toBe('/desk');
    expect(homeFor('admin')).toBe('/admin/people');
  });

  it('shows a person only the pages their role may open', () => {
    for (const role of ['inspector', 'supervisor', 'quality', 'admin'] as const) {
      for (const entry of navFor(role)) {
        const route = ROUTES.find((r) => r.path === entry.path);
        if (route) expect(route.roles).toContain(role);
      }
    }
    expect(navFor('inspector').map((e) => e.label)).toEqual(['Presses', 'Sending']);
    expect(navFor('quality').map((e) => e.section)).toContain('Desk');
    expect(navFor('admin').every((e) => e.section === 'Administration')).toBe(true);
  });
});

describe('where a person is sent', () => {
  it('sends everyone to sign-in while nobody is on the tablet', () => {
    expect(redirectFor('/presses', undefined)).toBe('/sign-in');
    expect(redirectFor('/pin', undefined)).toBe('/sign-in');
    expect(redirectFor('/sign-in', undefined)).toBeUndefined();
  });

  it('keeps a person on pages for their role and sends them home from the rest', () => {
    expect(redirectFor('/lots/7e57/part', 'inspector')).toBeUndefined();
    expect(redirectFor('/review', 'inspector')).toBe('/presses');
    expect(redirectFor('/', 'supervisor')).toBe('/review');
    expect(redirectFor('/no/such/page', 'admin')).toBe('/admin/people');
    expect(redirectFor('/desk/compounds', 'quality')).toBeUndefined();
    expect(redirectFor('/desk/compounds', 'inspector')).toBe('/presses');
    expect(redirectFor('/pin', 'quality')).toBeUndefined();
  });
});
