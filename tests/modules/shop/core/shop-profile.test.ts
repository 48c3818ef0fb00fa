import { contactLines, DEFAULT_SHOP_PROFILE, shopProfileInput } from '@/modules/shop/core/shop-profile';
import { buyerCaption, workCaption } from '@/modules/shop/core/work-caption';

const profile = { address: ' 14 Tamsin Yard \r\n\nOld Wharf ', phone: '+1 555 0142', email: 'Sales@Larkspur.example', website: 'https://larkspur.example', locale: 'en-US', timeZone: 'America/Chicago', workshopIdleDays: 10 };

describe('the shop profile', () => {
  it('writes the letterhead as address lines, then telephone, e-mail and website, leaving out what is empty', () => {
    expect(contactLines(profile)).toEqual(['14 Tamsin Yard', 'Old Wharf', 'Telephone +1 555 0142', 'E-mail Sales@Larkspur.example', 'https://larkspur.example']);
    expect(contactLines({ ...profile, phone: '', website: '' })).toEqual(['14 Tamsin Yard', 'Old Wharf', 'E-mail Sales@Larkspur.example']);
    expect(contactLines(DEFAULT_SHOP_PROFILE)).toEqual([]);
  });

  it('keeps the e-mail in lower case and refuses a locale, zone, website or idle days that cannot be', () => {
    expect(shopProfileInput.parse(profile).email).toBe('sales@larkspur.example');
    const problem = (patch: object) => shopProfileInput.safeParse({ ...profile, ...patch }).error?.issues[0].path[0];
    expect(problem({ locale: 'english please' })).toBe('locale');
    expect(problem({ timeZone: 'Mars/Olympus' })).toBe('timeZone');
    expect(problem({ website: 'larkspur' })).toBe('website');
    expect(problem({ email: 'not an address' })).toBe('email');
    expect(problem({ workshopIdleDays: 0 })).toBe('workshopIdleDays');
    expect(problem({ workshopIdleDays: 2.5 })).toBe('workshopIdleDays');
    expect(problem({ phone: 'a\u0000b' })).toBe('phone');
    expect(shopProfileInput.safeParse({ ...profile, owner: 'x' }).success).toBe(false);
  });
});

describe('a workshop photo caption', () => {
  it('names the item for the staff and reads without the item number for the buyer', () => {
    const staff = workCaption('after', 4, 'Reshape and voice hammers', ' felt shaped ');
    expect(staff).toBe('After work (item 4, Reshape and voice hammers): felt shaped');
    expect(buyerCaption(staff)).toBe('After the work (reshape and voice hammers): felt shaped');
    expect(buyerCaption(workCaption('before', 7, 'Regulation', ''))).toBe('Before the work (regulation)');
    expect(buyerCaption('Keys from above')).toBe('Keys from above');
    expect(buyerCaption(null)).toBeNull();
  });
});
