import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

/** The way back from a design page to its project. */
export function ProjectBackLink({ orgId, projectId, label = 'Project' }: { orgId: string; projectId: string; label?: string }) {
  return (
    <p className="mb-2 text-sm">
      <Link to={paths.org.project.to(orgId, projectId)} className="text-accent-700 hover:underline">
        ← {label}
      </Link>
    </p>
  );
}
