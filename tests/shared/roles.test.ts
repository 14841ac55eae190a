import { describe, expect, it } from 'vitest';
import { CAPABILITIES, can, ROLES, type Capability, type Role } from '../../shared/roles';

// Written out by hand: a table derived from CAPABILITIES would agree with any change to it.
const Y = true;
const N = false;
const FOUNDATION: Record<Role, Partial<Record<Capability, boolean>>> = {
  admin: { 'team:read': Y, 'members:read': Y, 'members:manage': Y, 'events:read': Y, 'events:manage': Y },
  lead: { 'team:read': Y, 'members:read': Y, 'members:manage': N, 'events:read': Y, 'events:manage': N },
  crew: { 'team:read': Y, 'members:read': Y, 'members:manage': N, 'events:read': Y, 'events:manage': N },
  battery: { 'team:read': Y, 'members:read': Y, 'members:manage': N, 'events:read': Y, 'events:manage': N },
  safety: { 'team:read': Y, 'members:read': Y, 'members:manage': N, 'events:read': Y, 'events:manage': N },
  viewer: { 'team:read': Y, 'members:read': Y, 'members:manage': N, 'events:read': Y, 'events:manage': N },
};

describe('can(roles, capability)', () => {
  it('has a written-out expectation for every role', () => {
    expect(Object.keys(FOUNDATION).sort()).toEqual([...ROLES].sort());
  });

  for (const role of ROLES) {
    for (const [capability, expected] of Object.entries(FOUNDATION[role]) as [Capability, boolean][]) {
      it(`${role} ${expected ? 'may' : 'may not'} ${capability}`, () => {
        expect(can([role], capability)).toBe(expected);
      });
    }
  }

  it('lets only admin manage pit screens (a screen link opens the board to anyone holding it)', () => {
    expect(can(['admin'], 'screens:manage')).toBe(true);
    expect(can(['lead'], 'screens:manage')).toBe(false);
    expect(can(['crew'], 'screens:manage')).toBe(false);
    expect(can(['battery'], 'screens:manage')).toBe(false);
    expect(can(['safety'], 'screens:manage')).toBe(false);
    expect(can(['viewer'], 'screens:manage')).toBe(false);
  });

  it('lets only admin and safety read incidents (reports can name minors)', () => {
    const readers = ROLES.filter((role) => can([role], 'incidents:read'));
    expect(readers).toEqual(['admin', 'safety']);
    expect(can(['lead', 'crew', 'battery', 'viewer'], 'incidents:read')).toBe(false);
    expect(ROLES.filter((role) => can([role], 'incidents:manage'))).toEqual(['admin', 'safety']);
    expect(ROLES.filter((role) => can([role], 'alerts:manage'))).toEqual(['admin', 'safety']);
  });

  it('lets a viewer read and report an incident, and write nothing else', () => {
    const allowed = (Object.keys(CAPABILITIES) as Capability[]).filter((capability) => can(['viewer'], capability));
    expect(allowed.sort()).toEqual(['board:read', 'events:read', 'incidents:report', 'members:read', 'team:read']);
  });

  it('combines several roles as the union of what each grants', () => {
    expect(can(['crew'], 'batteries:manage')).toBe(false);
    expect(can(['battery'], 'checks:mark')).toBe(false);
    expect(can(['crew', 'battery'], 'batteries:manage')).toBe(true);
    expect(can(['crew', 'battery'], 'checks:mark')).toBe(true);
    // A union never grants what neither role has.
    expect(can(['crew', 'battery'], 'repairs:manage')).toBe(false);
    expect(can(['viewer', 'safety'], 'incidents:read')).toBe(true);
    expect(can(['viewer', 'lead'], 'events:manage')).toBe(false);
  });

  it('denies everything to a member without roles', () => {
    for (const capability of Object.keys(CAPABILITIES) as Capability[]) {
      expect(can([], capability), capability).toBe(false);
    }
  });

  it('denies an unknown capability, even to admin', () => {
    expect(can(['admin'], 'robots:launch' as Capability)).toBe(false);
    expect(can([...ROLES], '' as Capability)).toBe(false);
  });

  it('denies, and does not throw for, capability names that objects inherit', () => {
    for (const name of ['toString', 'constructor', '__proto__', 'hasOwnProperty']) {
      expect(() => can(['admin'], name as Capability), name).not.toThrow();
      expect(can([...ROLES], name as Capability), name).toBe(false);
    }
  });

  it('denies an unknown role', () => {
    expect(can(['pilot' as Role], 'board:read')).toBe(false);
    expect(can(['Admin' as Role], 'events:manage')).toBe(false);
  });
});
