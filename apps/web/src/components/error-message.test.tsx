import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ApiError, apiErrorFromResponse } from '../lib/api-error';
import { ErrorMessage } from './error-message';

describe('<ErrorMessage error />', () => {
  const rejected = new ApiError(400, 'validation_failed', 'The request was not accepted.', [
    { path: 'email', message: 'Enter a valid e-mail address.' },
    { path: 'role', message: 'Choose one of the listed roles.' },
  ]);

  it('shows the server’s message and each field issue, as an alert', () => {
    render(<ErrorMessage error={rejected} />);
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('The request was not accepted.');
    expect(screen.getAllByRole('listitem').map((item) => item.textContent)).toEqual([
      'email: Enter a valid e-mail address.',
      'role: Choose one of the listed roles.',
    ]);
  });

  it('leaves out the issues a form already shows beside its fields', () => {
    render(<ErrorMessage error={rejected} hideIssuesFor={['email']} />);
    expect(screen.getAllByRole('listitem').map((item) => item.textContent)).toEqual(['role: Choose one of the listed roles.']);
  });

  it('says something a person can act on for an error that is not from the API', () => {
    render(<ErrorMessage error={new TypeError('x is undefined')} />);
    expect(screen.getByRole('alert')).toHaveTextContent('Reload it and try again.');
    expect(screen.getByRole('alert')).not.toHaveTextContent('x is undefined');
  });

  it('offers "Try again" when given a retry', () => {
    render(<ErrorMessage error={rejected} onRetry={() => undefined} />);
    expect(screen.getByRole('button', { name: 'Try again' })).toBeEnabled();
  });
});

describe('apiErrorFromResponse(response)', () => {
  it('keeps code, message and issues from an error body', async () => {
    const body = { code: 'last_admin', message: 'Keep at least one administrator.', issues: [{ path: 'role', message: 'x' }] };
    const error = await apiErrorFromResponse(new Response(JSON.stringify(body), { status: 409 }));
    expect([error.status, error.code, error.message, error.issueFor('role')]).toEqual([409, 'last_admin', 'Keep at least one administrator.', 'x']);
  });

  it('falls back to plain words when the body is not an API error (e.g. a proxy page)', async () => {
    const error = await apiErrorFromResponse(new Response('<html>Bad gateway</html>', { status: 502 }));
    expect(error.code).toBe('http_502');
    expect(error.message).toMatch(/could not complete the request \(HTTP 502\)\. Try again/);
  });

  it('explains a 429 without a body as too many attempts', async () => {
    const error = await apiErrorFromResponse(new Response('', { status: 429 }));
    expect(error.message).toMatch(/Too many attempts/);
  });
});
