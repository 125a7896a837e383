/**
 * Navigation by role, from the foundation API contract: everyone signed in sees Home; the
 * administrator also Users, Audit trail and Outbox (issue 2, deliver 5 and 11).
 */
import { describe, expect, it } from 'vitest';
import { navigationFor, rolesForPath } from './navigation';
import { paths } from './paths';

const labels = (role: Parameters<typeof navigationFor>[0]) => navigationFor(role).map((item) => item.label);

describe('navigationFor', () => {
  it('gives the administrator Home, Users, Audit trail and Outbox', () => {
    expect(labels('administrator').slice(0, 1)).toEqual(['Home']);
    expect(labels('administrator')).toEqual(expect.arrayContaining(['Home', 'Users', 'Audit trail', 'Outbox']));
  });

  it.each(['engineer', 'technician', 'reviewer'] as const)('gives %s Home but none of the administrator pages', (role) => {
    expect(labels(role)).toContain('Home');
    for (const adminOnly of ['Users', 'Audit trail', 'Outbox']) expect(labels(role)).not.toContain(adminOnly);
  });
});

describe('rolesForPath', () => {
  it('limits the administrator pages to the administrator role', () => {
    for (const path of [paths.adminUsers, paths.adminAudit, paths.adminOutbox]) expect(rolesForPath(path)).toEqual(['administrator']);
  });

  it('fails loudly for a page with no navigation entry, so a new page cannot be left ungated', () => {
    expect(() => rolesForPath('/nowhere')).toThrow('/nowhere');
  });
});
