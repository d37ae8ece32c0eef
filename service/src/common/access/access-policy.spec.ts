import { describe, expect, it } from 'vitest';
import { NotFoundException } from '@nestjs/common';
import { ROLES } from '@fuelwright/shared';
import { ACTIONS, AccessPolicy, isAllowed, relationOf, type Action } from './access-policy.js';

const OWNER = 'owner-id';
const FRIEND = 'friend-id';
const STRANGER = 'stranger-id';
const resource = { ownerId: OWNER, sharedWith: [FRIEND] };
const readOnly: Action[] = ['view', 'comment', 'recommend-check', 'log-outcome'];

/** role x relation x action: the whole matrix, every cell asserted. */
describe('access policy matrix', () => {
  for (const role of ROLES) {
    for (const action of ACTIONS) {
      it(`${role} as owner may ${action}`, () => {
        expect(isAllowed({ id: OWNER, role }, resource, action)).toBe(true);
      });
      // The share grants, not the role: an invited coach's account may well be a racer account.
      const sharedExpected = readOnly.includes(action);
      it(`${role} shared-with ${sharedExpected ? 'may' : 'may not'} ${action}`, () => {
        expect(isAllowed({ id: FRIEND, role }, resource, action)).toBe(sharedExpected);
      });
      it(`${role} with no relation may not ${action}`, () => {
        expect(isAllowed({ id: STRANGER, role }, resource, action)).toBe(false);
      });
    }
  }

  it('a share accepted by an account of any role makes it "shared"; the role alone makes nobody "shared"', () => {
    for (const role of ROLES) {
      expect(relationOf({ id: FRIEND, role }, resource)).toBe('shared');
      expect(relationOf({ id: STRANGER, role }, resource)).toBe('other');
    }
    expect(relationOf({ id: FRIEND, role: 'coach' }, { ownerId: OWNER })).toBe('other');
  });

  it('answers 404, not 403, when access is refused or the item does not exist', () => {
    const policy = new AccessPolicy(undefined as never);
    expect(() => policy.require({ id: STRANGER, role: 'admin' }, resource, 'view', 'kart')).toThrow(NotFoundException);
    expect(() => policy.require({ id: OWNER, role: 'racer' }, undefined, 'view', 'kart')).toThrow('No such kart.');
    expect(policy.require({ id: OWNER, role: 'racer' }, resource, 'edit')).toBe(resource);
  });
});
