import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { render, type RenderResult } from '@testing-library/react';
import type { ReactElement } from 'react';
import { MemoryRouter, Route, Routes, useLocation } from 'react-router-dom';
import { createQueryClient } from '../lib/query-client';

/** Prints the current path, so tests can see where a navigation went. */
function LocationProbe() {
  const location = useLocation();
  return <output aria-label="Current path">{location.pathname}</output>;
}

/** Renders UI inside the app's real providers and a memory router at `path`. */
export function renderWithProviders(
  ui: ReactElement,
  { path = '/', queryClient = createQueryClient() }: { path?: string; queryClient?: QueryClient } = {},
): RenderResult & { queryClient: QueryClient } {
  const result = render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter initialEntries={[path]}>
        <Routes>
          <Route path="*" element={<>{ui}<LocationProbe /></>} />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return { ...result, queryClient };
}
