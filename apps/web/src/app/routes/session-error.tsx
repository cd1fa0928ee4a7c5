import { ErrorMessage } from '../../components/error-message';
import { Brand } from '../layout/brand';

/** The session could not be checked at all (server down, network gone): say so and offer a retry. */
export function SessionError({ error, onRetry }: { error: unknown; onRetry: () => unknown }) {
  return (
    <div className="mx-auto flex min-h-screen max-w-md flex-col justify-center gap-6 px-4">
      <Brand />
      <ErrorMessage error={error} title="We could not check whether you are signed in" onRetry={() => void onRetry()} />
    </div>
  );
}
