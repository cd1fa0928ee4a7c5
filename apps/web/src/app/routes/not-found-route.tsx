import { useParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { Brand } from '../layout/brand';
import { NotFoundPanel } from './not-found-panel';

/** Inside an organisation the shell is already drawn; outside, the page brings its own frame. */
export function NotFoundRoute() {
  const { orgId } = useParams();
  if (orgId) return <NotFoundPanel what="page" homeTo={paths.org.home.to(orgId)} />;
  return (
    <div className="flex min-h-screen flex-col items-center gap-8 px-4 py-12">
      <Brand />
      <NotFoundPanel what="page" homeTo={paths.root.to()} />
    </div>
  );
}
