import { TEST_STATUS_LABELS, TEST_STATUSES } from '@porestack/types';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { TestStatusBadge } from './test-status-badge';

describe('<TestStatusBadge status />', () => {
  it('has a word for every status the server can send', () => {
    for (const status of TEST_STATUSES) expect(TEST_STATUS_LABELS[status]).toMatch(/\w/);
  });

  it('uses our own words, one distinct word per status', () => {
    expect(TEST_STATUSES.map((s) => TEST_STATUS_LABELS[s])).toEqual(['Draft', 'Readings in', 'Reduced', 'Awaiting review', 'Approved', 'Changes asked']);
  });

  it('shows the word and explains the state on hover', () => {
    render(<TestStatusBadge status="changes_requested" />);
    expect(screen.getByText('Changes asked')).toHaveAttribute('title', 'Sent back by a lab manager with a comment.');
  });
});
