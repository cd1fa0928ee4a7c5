import { Spinner } from '../../components/spinner';

export function FullPageSpinner() {
  return (
    <div className="flex min-h-screen items-center justify-center text-accent-600">
      <Spinner label="Loading Porestack…" />
    </div>
  );
}
