import { HttpErrorResponse } from '@angular/common/http';
import { ApiError, describeApiError, humanizeField, toApiError } from './api-error';

const response = (status: number, error: unknown) => new HttpErrorResponse({ status, error, url: '/api/v1/x' });

describe('toApiError', () => {
  it('reads the API error shape', () => {
    const error = toApiError(response(400, { error: { code: 'invalid_input', message: 'must be a number', field: 'tub.lengthIn' } }));
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'invalid_input', message: 'must be a number', field: 'tub.lengthIn' });
  });

  it('falls back to a plain sentence when the body is not ours', () => {
    expect(toApiError(response(0, new ProgressEvent('error'))).message).toMatch(/cannot be reached/);
    expect(toApiError(response(429, 'Too Many Requests')).message).toMatch(/Wait a minute/);
    expect(toApiError(response(502, '<html>')).message).toBe('The server answered 502. Try again in a moment.');
  });
});

describe('describeApiError', () => {
  it('names the field at fault', () => {
    const error = response(400, { error: { code: 'invalid_input', message: 'must be greater than zero', field: 'heightIn' } });
    expect(describeApiError(error)).toBe('Height in: must be greater than zero');
  });

  it('does not repeat a field the message already names', () => {
    const error = response(409, { error: { code: 'conflict', message: 'Email is already in use', field: 'email' } });
    expect(describeApiError(error)).toBe('Email is already in use');
  });

  it('turns field paths into words', () => {
    expect(humanizeField('tub.lengthIn')).toBe('Tub length in');
  });
});
