import { Link } from 'react-router-dom';
import { paths } from '../config/paths';

export function NotFoundMessage() {
  return (
    <div className="mx-auto max-w-xl py-12">
      <h1 className="text-3xl font-extrabold">Page not found</h1>
      <p className="mt-3">There is no page at this address. It may have moved, or the link may be mistyped.</p>
      <Link to={paths.home} className="mt-6 inline-block text-link">
        Go to your home page
      </Link>
    </div>
  );
}
