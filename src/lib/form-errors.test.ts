import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { serverErrorsApply } from './form-errors';

interface Values {
  email: string;
  seamAllowance: string;
}

function collect() {
  const set: Record<string, { message?: string; focus?: boolean }> = {};
  const setError = (name: string, error: { message?: string }, options?: { shouldFocus?: boolean }) => {
    set[name] = { message: error.message, focus: options?.shouldFocus };
  };
  return { set, setError: setError as never };
}

describe('serverErrorsApply', () => {
  it("puts each field error beside its field and the server's message on the form", () => {
    const { set, setError } = collect();
    const error = new ApiError(409, 'email_taken', 'Some fields need attention.', { email: 'An account with this e-mail already exists' });
    serverErrorsApply<Values>(error, setError, ['email', 'seamAllowance']);
    expect(set.email).toEqual({ message: 'An account with this e-mail already exists', focus: true });
    expect(set['root.server']?.message).toBe('Some fields need attention.');
  });

  it("maps the server's field names to the form's and keeps errors of fields the form lacks", () => {
    const { set, setError } = collect();
    const error = new ApiError(400, 'invalid', 'Some fields need attention.', {
      seamAllowanceMm: 'Seam allowance must be between 0 and 25.4 mm',
      version: 'Version is stale',
    });
    serverErrorsApply<Values>(error, setError, ['email', 'seamAllowance'], { seamAllowanceMm: 'seamAllowance' });
    expect(set.seamAllowance?.message).toBe('Seam allowance must be between 0 and 25.4 mm');
    expect(set['root.server']?.message).toBe('Some fields need attention. Version is stale');
  });

  it('says something went wrong when the failure is not an answer of the server', () => {
    const { set, setError } = collect();
    serverErrorsApply<Values>(new TypeError('boom'), setError, ['email']);
    expect(set['root.server']?.message).toBe('Something went wrong. Try again.');
    expect(Object.keys(set)).toEqual(['root.server']);
  });
});
