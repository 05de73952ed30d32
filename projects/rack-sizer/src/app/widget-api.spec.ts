import { TestBed } from '@angular/core/testing';
import { WIDGET_API_ORIGIN, WidgetApi, WidgetError } from './widget-api';

const SPEC = { unit: 'in' as const, tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 9, columns: 3 } };

function setUp(answer: () => Promise<Response>) {
  const fetchMock = vi.fn((_url: string, _init: RequestInit) => answer());
  vi.stubGlobal('fetch', fetchMock);
  TestBed.configureTestingModule({ providers: [{ provide: WIDGET_API_ORIGIN, useValue: 'https://tubwright.example' }] });
  return { api: TestBed.inject(WidgetApi), fetchMock };
}
const json = (status: number, body: unknown) => Promise.resolve(new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } }));

describe('WidgetApi', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('calls the gateway the script came from, with the key and no cookies', async () => {
    const { api, fetchMock } = setUp(() => json(200, { unit: 'in' }));
    await api.plan('tw_pk_1', SPEC);
    const [url, init] = fetchMock.mock.calls[0]!;
    expect(url).toBe('https://tubwright.example/api/v1/calc/rack-plan');
    expect(init.method).toBe('POST');
    expect(init.credentials).toBe('omit');
    expect(init.headers).toEqual({ 'content-type': 'application/json', 'x-api-key': 'tw_pk_1' });
    expect(JSON.parse(init.body as string)).toEqual(SPEC);
  });

  it('sends quote requests with the idempotency key', async () => {
    const { api, fetchMock } = setUp(() => json(201, { reference: 'Q-2026-0001' }));
    const receipt = await api.requestQuote('tw_pk_1', { name: 'A', email: 'a@example.test', consent: true, spec: SPEC }, 'idem-1');
    expect(receipt.reference).toBe('Q-2026-0001');
    expect(fetchMock.mock.calls[0]![0]).toBe('https://tubwright.example/api/v1/quote-requests');
    expect(fetchMock.mock.calls[0]![1].headers).toMatchObject({ 'idempotency-key': 'idem-1', 'x-api-key': 'tw_pk_1' });
  });

  it("passes on the server's words for input problems, with the field", async () => {
    const { api } = setUp(() => json(422, { error: { code: 'unprocessable', message: 'The level opening is taller than the sheet.', field: 'tub.height' } }));
    const error = await api.plan('tw_pk_1', SPEC).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(WidgetError);
    expect(error).toMatchObject({ status: 422, field: 'tub.height', message: 'The level opening is taller than the sheet.' });
  });

  it('says who must act on key problems, refused origins and floods', async () => {
    for (const [status, words] of [
      [401, 'not valid any more'],
      [403, 'may not use'],
      [429, 'Wait a minute'],
    ] as const) {
      const { api } = setUp(() => json(status, { error: { code: 'x', message: 'internal words' } }));
      await expect(api.plan('tw_pk_1', SPEC)).rejects.toThrow(words);
      TestBed.resetTestingModule();
    }
    const { api } = setUp(() => Promise.reject(new TypeError('Failed to fetch')));
    await expect(api.plan('tw_pk_1', SPEC)).rejects.toThrow('cannot reach the shop');
  });

  it('asks nothing without a key', async () => {
    const { api, fetchMock } = setUp(() => json(200, {}));
    await expect(api.plan('', SPEC)).rejects.toThrow('no shop key');
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
