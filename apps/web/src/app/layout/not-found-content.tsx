import { ButtonLink } from '@/components/button';
import { paths } from '@/config/paths';

/** The body of the not-found page, also shown when a route throws a 404. */
export function NotFoundContent() {
  return (
    <div className="mx-auto max-w-xl py-12 text-center">
      <p className="text-sm font-semibold tracking-wide text-graphite-600 uppercase">Error 404</p>
      <h1 className="mt-2 text-2xl font-bold">There is no page at this address</h1>
      <p className="mt-3 text-graphite-600">
        The link may be mistyped, or the page may have moved. Check the address, or start again from home.
      </p>
      <ButtonLink to={paths.home.build()} className="mt-6">
        Go to home
      </ButtonLink>
    </div>
  );
}
