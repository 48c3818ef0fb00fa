import { can, isRole, ROLES } from '@/modules/accounts/core/roles';

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
    ['manager', 'editShopProfile', true],
    ['floor', 'editShopProfile', false],
    ['manager', 'setPrices', true],
    ['floor', 'setPrices', false],
    ['intake', 'setPrices', false],
    ['manager', 'seeIdleWorkshop', true],
    ['technician', 'seeIdleWorkshop', false],
  ] as const)('%s may %s: %s', (role, ability, expected) => expect(can(role, ability)).toBe(expected));
  it('rejects what is not a role', () => {
    expect(isRole('owner')).toBe(false);
    expect(isRole('floor')).toBe(true);
  });
});
