import { HttpErrorResponse } from '@angular/common/http';

import { describeHttpError, isApiErrorBody } from './api-error';

describe('describeHttpError', () => {
  function failure(status: number, error: unknown, statusText = 'Error'): HttpErrorResponse {
    return new HttpErrorResponse({ status, statusText, error, url: 'http://localhost/api/v1/species?q=H2O' });
  }

  it('uses the API message', () => {
    const response = failure(404, { error: 'NotFound', message: 'No species with id 42.' });
    expect(describeHttpError(response)).toBe('No species with id 42.');
  });

  it('adds validation details to the message', () => {
    const response = failure(400, {
      error: 'ValidationFailed',
      message: 'The value was not saved',
      details: [{ field: 'uncertainty', message: 'uncertainty must not be negative' }, 'temperature is required'],
    });
    expect(describeHttpError(response)).toBe(
      'The value was not saved: uncertainty must not be negative; temperature is required',
    );
  });

  it('shows at most three details and counts the rest', () => {
    const response = failure(400, { error: 'ValidationFailed', message: 'Invalid', details: ['a', 'b', 'c', 'd', 'e'] });
    expect(describeHttpError(response)).toBe('Invalid: a; b; c (and 2 more)');
  });

  it('explains a request that never reached the server', () => {
    const response = new HttpErrorResponse({ status: 0, error: new ProgressEvent('error') });
    expect(describeHttpError(response)).toContain('cannot reach its server');
  });

  it('names the status and path when the body is not an API error', () => {
    expect(describeHttpError(failure(502, '<html>Bad gateway</html>', 'Bad Gateway'))).toBe(
      'The server answered 502 Bad Gateway for /api/v1/species.',
    );
  });
});

describe('isApiErrorBody', () => {
  it('accepts {error, message} and rejects anything else', () => {
    expect(isApiErrorBody({ error: 'Conflict', message: 'Already exists', details: null })).toBeTrue();
    expect(isApiErrorBody({ message: 'no error code' })).toBeFalse();
    expect(isApiErrorBody('text')).toBeFalse();
    expect(isApiErrorBody(null)).toBeFalse();
  });
});
