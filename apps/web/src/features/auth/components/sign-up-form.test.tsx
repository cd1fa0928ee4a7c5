import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../test/render';
import { SignUpForm } from './sign-up-form';

describe('<SignUpForm />', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('checks every field with the shared SignUpSchema and sends nothing while one is wrong', async () => {
    const fetchSpy = vi.fn();
    vi.stubGlobal('fetch', fetchSpy);
    const user = userEvent.setup();
    renderWithProviders(<SignUpForm onSent={() => undefined} />);

    await user.type(screen.getByLabelText('E-mail address'), 'not-an-address');
    await user.type(screen.getByLabelText('Password'), 'short{Enter}');

    expect(screen.getByLabelText('Your name')).toHaveAccessibleDescription('Enter your name.');
    expect(screen.getByLabelText('E-mail address')).toHaveAccessibleDescription('Enter a valid e-mail address, like name@example.org.');
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription(
      '10 to 72 characters. A short sentence is easier to remember than symbols. Use a password of at least 10 characters.',
    );
    expect(screen.getByLabelText('Organisation name')).toBeInvalid();
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('puts the cursor in the first field, so typing can start at once', () => {
    renderWithProviders(<SignUpForm onSent={() => undefined} />);
    expect(screen.getByLabelText('Your name')).toHaveFocus();
  });

  it('clears a message once the field is corrected and the form is sent again', async () => {
    vi.stubGlobal('fetch', vi.fn(() => new Promise(() => undefined)));
    const user = userEvent.setup();
    renderWithProviders(<SignUpForm onSent={() => undefined} />);
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    expect(screen.getByText('Enter your name.')).toBeInTheDocument();

    await user.type(screen.getByLabelText('Your name'), 'Ada Fenwright');
    await user.type(screen.getByLabelText('E-mail address'), 'ada@example.org');
    await user.type(screen.getByLabelText('Password'), 'long enough password');
    await user.type(screen.getByLabelText('Organisation name'), 'Fenwright Testing');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(screen.queryByText('Enter your name.')).not.toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Sending the link…' })).toBeDisabled();
  });
});

describe('<SignUpForm /> and the keyboard', () => {
  it('moves the cursor to the first field that needs fixing', async () => {
    const user = userEvent.setup();
    renderWithProviders(<SignUpForm onSent={() => undefined} />);
    await user.type(screen.getByLabelText('Your name'), 'Ada Fenwright');
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    expect(screen.getByLabelText('E-mail address')).toHaveFocus();
  });
});
