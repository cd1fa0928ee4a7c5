import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../lib/api-error';
import { ConfirmDialog } from './confirm-dialog';

describe('<ConfirmDialog />', () => {
  const props = { open: true, title: 'Remove Kit?', confirmLabel: 'Remove member', children: 'Kit loses access.' };

  it('is a labelled modal question whose focus starts on the safe choice', () => {
    render(<ConfirmDialog {...props} onConfirm={() => undefined} onCancel={() => undefined} />);
    const dialog = screen.getByRole('alertdialog', { name: 'Remove Kit?' });
    expect(dialog).toHaveAccessibleDescription('Kit loses access.');
    expect(screen.getByRole('button', { name: 'Cancel' })).toHaveFocus();
  });

  it('cancels on Escape and confirms on its button', async () => {
    const user = userEvent.setup();
    const onCancel = vi.fn();
    const onConfirm = vi.fn();
    render(<ConfirmDialog {...props} onConfirm={onConfirm} onCancel={onCancel} />);
    await user.keyboard('{Escape}');
    expect(onCancel).toHaveBeenCalledOnce();
    await user.click(screen.getByRole('button', { name: 'Remove member' }));
    expect(onConfirm).toHaveBeenCalledOnce();
  });

  it('keeps Tab inside the dialog', async () => {
    const user = userEvent.setup();
    render(<ConfirmDialog {...props} onConfirm={() => undefined} onCancel={() => undefined} />);
    await user.tab();
    expect(screen.getByRole('button', { name: 'Remove member' })).toHaveFocus();
    await user.tab();
    expect(screen.getByRole('button', { name: 'Cancel' })).toHaveFocus();
  });

  it('shows why the action failed, inside the dialog', () => {
    const error = new ApiError(409, 'last_admin', 'An organisation needs at least one administrator.');
    render(<ConfirmDialog {...props} error={error} onConfirm={() => undefined} onCancel={() => undefined} />);
    expect(screen.getByRole('alert')).toHaveTextContent('An organisation needs at least one administrator.');
  });

  it('renders nothing while closed', () => {
    render(<ConfirmDialog {...props} open={false} onConfirm={() => undefined} onCancel={() => undefined} />);
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
  });
});
