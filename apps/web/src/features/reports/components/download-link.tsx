import { buttonClasses } from '../../../components/button';

/**
 * A file the API sends as an attachment: a plain link (the session cookie goes with it), so the
 * browser saves it the usual way and nothing is held in page memory.
 */
export function DownloadLink({ href, children, variant = 'secondary' }: { href: string; children: string; variant?: 'primary' | 'secondary' }) {
  return (
    <a href={href} download className={buttonClasses(variant, 'sm')}>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="h-4 w-4" fill="none" stroke="currentColor" strokeWidth="1.6">
        <path d="M8 2v8m0 0 3-3m-3 3L5 7M3 12.5h10" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
      {children}
    </a>
  );
}
