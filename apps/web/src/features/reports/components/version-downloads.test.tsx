import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../test/render';
import { VersionDownloads } from './version-downloads';

const ORG = '11111111-1111-4111-8111-111111111111';
const RECORD = '22222222-2222-4222-8222-222222222222';
const base = `/api/orgs/${ORG}/soil-records/${RECORD}/versions/2/report`;
const report = (state: string, extra: object = {}) => ({
  id: '33333333-3333-4333-8333-333333333333',
  kind: 'test-report',
  state,
  message: null,
  jobId: '44444444-4444-4444-8444-444444444444',
  fileName: null,
  sha256: null,
  byteSize: null,
  generatedAt: null,
  ...extra,
});
const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

/** The API as the component meets it: the report's state, the CSRF token, and the retry. */
function stubApi(first: Response, afterRetry = report('queued')) {
  const calls: Array<{ url: string; method: string }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      calls.push({ url, method: init?.method ?? 'GET' });
      if (url === '/api/auth/csrf') return json({ csrfToken: 'token' });
      if (url === `${base}/retry`) return json(afterRetry, 202);
      return first.clone();
    }),
  );
  return calls;
}

describe('<VersionDownloads />', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('when the report is ready, then it offers the PDF and the spreadsheet as downloads and shows the hash', async () => {
    const sha = 'a'.repeat(64);
    stubApi(json(report('ready', { sha256: sha, byteSize: 410_000, generatedAt: '2026-03-02T10:15:00.000Z', fileName: 'x.pdf' })));
    renderWithProviders(<VersionDownloads orgId={ORG} recordId={RECORD} version={2} canRetry={false} />);
    // The first render of the file also loads the modules: allow it more than the default second.
    const pdf = await screen.findByRole('link', { name: 'Download the test report (PDF)' }, { timeout: 5000 });
    expect(pdf).toHaveAttribute('href', `${base}/pdf`);
    expect(screen.getByText(sha)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Reduced data (XLSX)' })).toHaveAttribute('href', `/api/orgs/${ORG}/soil-records/${RECORD}/versions/2/data.xlsx`);
  });

  it('when printing failed, then a lab manager is offered the retry, which asks the API and shows the report printing', async () => {
    const calls = stubApi(json(report('failed', { message: 'The report could not be printed because of a problem on our side.' })));
    renderWithProviders(<VersionDownloads orgId={ORG} recordId={RECORD} version={2} canRetry />);
    expect(await screen.findByText('The report could not be printed because of a problem on our side.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Try printing the report again' }));
    await waitFor(() => expect(screen.getByText(/The test report is being printed/)).toBeInTheDocument());
    expect(calls).toContainEqual({ url: `${base}/retry`, method: 'POST' });
  });

  it('when printing failed and the reader may not retry, then no retry button is offered', async () => {
    stubApi(json(report('failed', { message: 'The report could not be printed.' })));
    renderWithProviders(<VersionDownloads orgId={ORG} recordId={RECORD} version={2} canRetry={false} />);
    expect(await screen.findByText('The report could not be printed.')).toBeInTheDocument();
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('when the version has no report (approved before reports), then it says so and a lab manager can print one', async () => {
    stubApi(json({ code: 'not_found', message: 'No report has been issued for this version.' }, 404));
    renderWithProviders(<VersionDownloads orgId={ORG} recordId={RECORD} version={2} canRetry />);
    expect(await screen.findByText('No test report for this version yet')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Print the test report' })).toBeInTheDocument();
  });
});
