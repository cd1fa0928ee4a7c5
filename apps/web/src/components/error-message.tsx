import type { ReactNode } from 'react';
import { ApiError, messageOf } from '../lib/api-error';
import { Alert } from './alert';
import { Button } from './button';

type ErrorMessageProps = {
  error: unknown;
  title?: string;
  /** Field issues the form already shows beside its fields are left out of the list here. */
  hideIssuesFor?: readonly string[];
  onRetry?: () => void;
  children?: ReactNode;
};

/** Shows the server's message (and its field issues) for a failed request, never a blank space. */
export function ErrorMessage({ error, title, hideIssuesFor = [], onRetry, children }: ErrorMessageProps) {
  const issues =
    error instanceof ApiError ? error.issues.filter((issue) => !hideIssuesFor.includes(issue.path.split('.')[0] ?? '')) : [];
  return (
    <Alert tone="error" {...(title ? { title } : {})}>
      <p>{messageOf(error)}</p>
      {issues.length > 0 ? (
        <ul className="mt-2 list-disc space-y-0.5 pl-5">
          {issues.map((issue) => (
            <li key={`${issue.path}:${issue.message}`}>
              {issue.path ? <span className="font-medium">{issue.path}: </span> : null}
              {issue.message}
            </li>
          ))}
        </ul>
      ) : null}
      {children}
      {onRetry ? (
        <Button variant="secondary" size="sm" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </Alert>
  );
}
