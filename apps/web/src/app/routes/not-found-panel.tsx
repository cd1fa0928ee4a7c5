import { Link } from 'react-router-dom';
import { buttonClasses } from '../../components/button';

type NotFoundPanelProps = {
  /** "page", "organisation": what could not be found. */
  what: string;
  homeTo: string;
};

export function NotFoundPanel({ what, homeTo }: NotFoundPanelProps) {
  return (
    <div className="mx-auto max-w-lg rounded-lg border border-slate-200 bg-white p-6">
      <p className="text-sm font-medium text-accent-700">Not found</p>
      <h1 className="mt-1 text-lg font-semibold text-slate-900">We could not find this {what}</h1>
      <p className="mt-2 text-sm text-slate-700">
        The address may be mistyped, the {what} may have been removed, or it belongs to an organisation you are not a
        member of. Check the link, or start again from your organisation home.
      </p>
      <Link to={homeTo} className={`${buttonClasses('secondary')} mt-5`}>
        Go to your organisation home
      </Link>
    </div>
  );
}
