import { BoreholeCreateSchema, SignInSchema } from '@porestack/types';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { TextField } from '../components/text-field';
import { ApiError } from './api-error';
import type { FieldErrors } from './form-errors';
import { numberOrNull } from './form-numbers';
import { useSchemaForm } from './use-schema-form';

function SignInLikeForm({ onValid, serverError, check }: {
  onValid: (data: unknown) => void;
  serverError?: unknown;
  check?: (values: Record<string, string>, schemaErrors: FieldErrors) => FieldErrors;
}) {
  const { errors, onSubmit } = useSchemaForm(SignInSchema, { onValid, serverError, ...(check ? { check } : {}) });
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Sign in">
      <TextField label="E-mail address" name="email" error={errors['email']} />
      <TextField label="Password" name="password" type="password" error={errors['password']} />
      <button type="submit">Sign in</button>
    </form>
  );
}

function BoreholeLikeForm({ onValid }: { onValid: (data: unknown) => void }) {
  const { errors, onSubmit } = useSchemaForm(BoreholeCreateSchema, {
    toValues: (values) => ({ name: values['name'], groundLevelMOd: numberOrNull(values['groundLevelMOd']), waterTableDepthM: numberOrNull(values['waterTableDepthM']) }),
    onValid,
  });
  return (
    <form noValidate onSubmit={onSubmit} aria-label="New borehole">
      <TextField label="Borehole name" name="name" error={errors['name']} />
      <TextField label="Ground level (m OD)" name="groundLevelMOd" error={errors['groundLevelMOd']} />
      <TextField label="Water table depth (m)" name="waterTableDepthM" error={errors['waterTableDepthM']} />
      <button type="submit">Add borehole</button>
    </form>
  );
}

describe('useSchemaForm(schema, { toValues, check, serverError, onValid })', () => {
  it('shows one message per wrong field, moves the cursor to the first and sends nothing', async () => {
    const onValid = vi.fn();
    const user = userEvent.setup();
    render(<SignInLikeForm onValid={onValid} />);

    await user.type(screen.getByLabelText('Password'), 'secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(screen.getByLabelText('E-mail address')).toHaveAccessibleDescription('Enter a valid e-mail address, like name@example.org.');
    expect(screen.getByLabelText('E-mail address')).toHaveFocus();
    expect(screen.getByLabelText('Password')).toBeValid();
    expect(onValid).not.toHaveBeenCalled();
  });

  it('hands the values as the schema parsed them to onValid, with the form, and clears the messages', async () => {
    const onValid = vi.fn();
    const user = userEvent.setup();
    render(<SignInLikeForm onValid={onValid} />);
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();

    await user.type(screen.getByLabelText('E-mail address'), 'Ada@Example.ORG');
    await user.type(screen.getByLabelText('Password'), 'secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(onValid).toHaveBeenCalledOnce();
    expect(onValid).toHaveBeenCalledWith({ email: 'ada@example.org', password: 'secret' }, screen.getByRole('form', { name: 'Sign in' }));
    expect(screen.queryByText('Enter your password.')).not.toBeInTheDocument();
    expect(screen.queryByText('Enter a valid e-mail address, like name@example.org.')).not.toBeInTheDocument();
  });

  it('validates what toValues makes of the strings, so numbers reach onValid as numbers', async () => {
    const onValid = vi.fn();
    const user = userEvent.setup();
    render(<BoreholeLikeForm onValid={onValid} />);

    await user.type(screen.getByLabelText('Borehole name'), 'BH-04');
    await user.type(screen.getByLabelText('Water table depth (m)'), '-1');
    await user.click(screen.getByRole('button', { name: 'Add borehole' }));
    expect(screen.getByLabelText('Water table depth (m)')).toHaveAccessibleDescription(
      'The water table depth is measured down from ground level, so it cannot be negative.',
    );
    expect(screen.getByLabelText('Water table depth (m)')).toHaveFocus();

    await user.clear(screen.getByLabelText('Water table depth (m)'));
    await user.type(screen.getByLabelText('Water table depth (m)'), '1,5');
    await user.type(screen.getByLabelText('Ground level (m OD)'), '12.3');
    await user.click(screen.getByRole('button', { name: 'Add borehole' }));
    expect(onValid).toHaveBeenCalledWith({ name: 'BH-04', groundLevelMOd: 12.3, waterTableDepthM: 1.5 }, expect.anything());
  });

  it('shows the messages check returns and sends nothing while there are any, even when the schema passes', async () => {
    const onValid = vi.fn();
    const user = userEvent.setup();
    const check = (values: Record<string, string>, schemaErrors: FieldErrors): FieldErrors =>
      (values['password'] ?? '').length < 10 ? { ...schemaErrors, password: 'Use a password of at least 10 characters.' } : schemaErrors;
    render(<SignInLikeForm onValid={onValid} check={check} />);

    await user.type(screen.getByLabelText('E-mail address'), 'ada@example.org');
    await user.type(screen.getByLabelText('Password'), 'secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription('Use a password of at least 10 characters.');
    expect(screen.getByLabelText('Password')).toHaveFocus();
    expect(onValid).not.toHaveBeenCalled();
  });

  it('shows the field issues of a failed request beside their fields, until the next attempt finds its own', async () => {
    const serverError = new ApiError(422, 'VALIDATION', 'Check the marked fields.', [{ path: 'email', message: 'This address is not allowed here.' }]);
    const user = userEvent.setup();
    render(<SignInLikeForm onValid={() => undefined} serverError={serverError} />);
    expect(screen.getByLabelText('E-mail address')).toHaveAccessibleDescription('This address is not allowed here.');

    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByLabelText('E-mail address')).toHaveAccessibleDescription('Enter a valid e-mail address, like name@example.org.');
  });
});
