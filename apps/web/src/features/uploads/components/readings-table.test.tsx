import { screen } from '@testing-library/react';
import { Profiler, useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../test/render';
import { ReadingsTable } from './readings-table';

const page = {
  total: 3,
  offset: 0,
  limit: 1000,
  readings: [0.1, 0.25, 1].map((elapsedMin, n) => ({ rowNumber: n + 2, incrementIndex: 1, stressKpa: 25, elapsedMin, deformationMm: 0.01 * (n + 1) })),
};

/** Lets the test re-render the table from outside, the way a refetch or a job poll does on the test page. */
function Harness({ onCommit }: { onCommit: () => void }) {
  const [tick, setTick] = useState(0);
  return (
    <>
      <button type="button" onClick={() => setTick(tick + 1)}>Re-render</button>
      <Profiler id="readings" onRender={onCommit}>
        <ReadingsTable orgId="org-1" testId="test-1" />
      </Profiler>
    </>
  );
}

describe('<ReadingsTable />', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('settles after a re-render instead of updating itself forever (which starved tab changes on the test page)', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify(page), { status: 200, headers: { 'content-type': 'application/json' } })));
    let commits = 0;
    renderWithProviders(<Harness onCommit={() => (commits += 1)} />);
    expect(await screen.findByText(/3 readings/)).toBeInTheDocument();

    screen.getByRole('button', { name: 'Re-render' }).click();
    screen.getByRole('button', { name: 'Re-render' }).click();
    await new Promise((resolve) => setTimeout(resolve, 300));
    const settled = commits;
    await new Promise((resolve) => setTimeout(resolve, 300));

    expect(commits).toBe(settled);
    expect(settled).toBeLessThan(20);
  });
});
