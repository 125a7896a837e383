/** Server field errors go beside the field they concern (issue 2, deliver 7; DESIGN.md "errors sit beside the field"). */
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-client';
import { applyServerErrors } from './form-errors';

type InviteFields = { email: string; displayName: string };

describe('applyServerErrors', () => {
  it('sets each matching field error and returns no banner message', () => {
    const setError = vi.fn();
    const error = new ApiError({ status: 409, code: 'conflict', message: 'exists', fields: { email: 'already exists' } });
    expect(applyServerErrors<InviteFields>(error, setError, ['email', 'displayName'])).toBeUndefined();
    expect(setError).toHaveBeenCalledExactlyOnceWith('email', { type: 'server', message: 'already exists' });
  });

  it('returns the server message when no field of the form matches', () => {
    const setError = vi.fn();
    const error = new ApiError({ status: 401, code: 'invalid_credentials', message: 'E-mail or password is wrong.' });
    expect(applyServerErrors<InviteFields>(error, setError, ['email'])).toBe('E-mail or password is wrong.');
    expect(setError).not.toHaveBeenCalled();
  });

  it('ignores fields the form does not have and still shows the message', () => {
    const setError = vi.fn();
    const error = new ApiError({ status: 400, code: 'bad_request', message: 'Unknown field', fields: { extra: 'not allowed' } });
    expect(applyServerErrors<InviteFields>(error, setError, ['email'])).toBe('Unknown field');
    expect(setError).not.toHaveBeenCalled();
  });

  it('shows a plain Error’s message', () => {
    expect(applyServerErrors<InviteFields>(new Error('offline'), vi.fn(), ['email'])).toBe('offline');
  });
});
