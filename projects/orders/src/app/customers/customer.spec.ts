import { CUSTOMER_SOURCES as API_SOURCES } from '@tubwright/shared/api/customers';
import { CUSTOMER_SOURCES, placeOf, sourceLabel } from './customer';

describe('customer sources', () => {
  it('mirror the API’s list, in its order', () => {
    expect(CUSTOMER_SOURCES).toEqual([...API_SOURCES]);
  });

  it('read as plain words, unknown ones as they are', () => {
    expect(sourceLabel('website-widget')).toBe('Rack sizer on the website');
    expect(sourceLabel('carrier-pigeon')).toBe('carrier-pigeon');
  });

  it('places a customer by city and region', () => {
    expect(placeOf({ city: 'Fresno', region: 'CA' })).toBe('Fresno, CA');
    expect(placeOf({ city: ' ', region: '' })).toBe('—');
  });
});
