import { ABILITIES, can, isRole, ROLES, rolesThatCan } from '@/modules/accounts/core/roles';

describe('roles', () => {
  it('has the four staff roles', () => expect(ROLES).toEqual(['intake', 'technician', 'floor', 'manager']));
  it.each([
    ['manager', 'manageUsers', true],
    ['intake', 'manageUsers', false],
    ['technician', 'createPianos', false],
    ['floor', 'readSellerDetails', false],
    ['intake', 'readSellerDetails', true],
    ['floor', 'readPianos', true],
    ['floor', 'recordTone', true],
    ['technician', 'recordTone', true],
    ['intake', 'readToneResults', true],
    ['manager', 'readToneResults', true],
    ['manager', 'tendBackgroundWork', true],
    ['floor', 'tendBackgroundWork', false],
    ['technician', 'tendBackgroundWork', false],
    ['technician', 'correctOwnTime', true],
    ['technician', 'correctAnyTime', false],
    ['manager', 'correctAnyTime', true],
    ['floor', 'correctOwnTime', false],
    ['floor', 'readWorkCosts', false],
    ['intake', 'readWorkCosts', true],
    ['intake', 'workAtBench', false],
    ['technician', 'workOnAnyItem', false],
    ['floor', 'showToBuyers', true],
    ['technician', 'showToBuyers', false],
    ['floor', 'manageDeposits', false],
    ['manager', 'editShopProfile', true],
    ['floor', 'editShopProfile', false],
    ['manager', 'setPrices', true],
    ['floor', 'setPrices', false],
    ['intake', 'setPrices', false],
    ['manager', 'seeIdleWorkshop', true],
    ['technician', 'seeIdleWorkshop', false],
  ] as const)('%s may %s: %s', (role, ability, expected) => expect(can(role, ability)).toBe(expected));
  it('gives a manager every ability, and no other role one no role has', () => {
    expect(ABILITIES.filter((a) => !can('manager', a))).toEqual([]);
    expect(new Set(ABILITIES).size).toBe(ABILITIES.length);
  });
  it('names the roles that can do a thing', () => {
    expect(rolesThatCan('sellPianos')).toEqual(['floor', 'manager']);
    expect(rolesThatCan('workAtBench')).toEqual(['technician', 'manager']);
  });
  it('rejects what is not a role', () => {
    expect(isRole('owner')).toBe(false);
    expect(isRole('floor')).toBe(true);
  });
});
