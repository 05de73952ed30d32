import { readOrigins, scopesFor, widgetSnippet } from './key-text';

describe('readOrigins', () => {
  it('reads one origin per line, or separated by commas, without repeats', () => {
    expect(readOrigins('https://racks.example\nhttp://127.0.0.1:8080, https://racks.example')).toEqual({
      origins: ['https://racks.example', 'http://127.0.0.1:8080'],
      errors: [],
    });
  });

  it('reduces an address copied from the address bar to its origin', () => {
    expect(readOrigins('https://racks.example/sizer?x=1').origins).toEqual(['https://racks.example']);
    expect(readOrigins('https://Racks.Example/').origins).toEqual(['https://racks.example']);
  });

  it('names what is not a web origin', () => {
    const { origins, errors } = readOrigins('racks.example ftp://files.example');
    expect(origins).toEqual([]);
    expect(errors).toEqual(['racks.example is not a web address (start with https://)', 'ftp://files.example is not an http or https address']);
  });
});

describe('widgetSnippet', () => {
  it('is a module script from the gateway and the element with the key', () => {
    expect(widgetSnippet('https://console.example', 'tw_pk_abc', { showPrices: true })).toBe(
      '<script type="module" src="https://console.example/widget/tw-rack-sizer.js"></script>\n<tw-rack-sizer key="tw_pk_abc" show-prices></tw-rack-sizer>',
    );
    expect(widgetSnippet('https://console.example', 'tw_pk_abc', { showPrices: false })).toContain('<tw-rack-sizer key="tw_pk_abc"></tw-rack-sizer>');
  });
});

describe('scopesFor', () => {
  it('keeps order status away from keys that live in web pages', () => {
    expect(scopesFor('publishable')).toEqual(['calculations', 'quote-requests']);
    expect(scopesFor('secret')).toEqual(['calculations', 'quote-requests', 'order-status']);
  });
});
