// Any address the client does not know.
import { Link } from 'react-router-dom';
import { paths } from '../lib/paths';

export function NotFoundPage() {
  return (
    <main className="mx-auto max-w-xl p-8">
      <h1 className="text-2xl font-semibold">Nothing here</h1>
      <p className="mt-2 text-ink-soft">This address does not lead to a Fieldshed screen.</p>
      <Link to={paths.farms.getHref()} className="mt-4 inline-block font-semibold text-clay-dark underline">
        Go to your farms
      </Link>
    </main>
  );
}
