import { describe, expect, it } from 'vitest';
import { homeFor, navFor, ROUTES } from './routes';

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
