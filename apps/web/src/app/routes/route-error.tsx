import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Button, buttonClasses } from '@/components/button';
import { isApiError } from '@/lib/api-client';
import { describeError, errorReference } from '@/lib/error-messages';
import { NotFoundContent } from '../layout/not-found-content';

/** A lazy page that fails to load after a new release was deployed. */
function isStaleBuild(error: unknown) {
  return error instanceof TypeError && /dynamically imported module|importing a module script/i.test(error.message);
}

function explain(error: unknown): { title: string; action: string; reference?: string | undefined } {
  if (isStaleBuild(error)) return { title: 'Keybed has been updated.', action: 'Reload the page to get the new version.' };
  if (isApiError(error)) return { ...describeError(error), reference: errorReference(error) };
  return { title: 'This page stopped working.', action: 'Reload the page. If it happens again, go back to home and try once more.' };
}

/** What went wrong in a page and what to do, shown inside the signed-in layout. */
export function PageRouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundContent />;
  const { title, action, reference } = explain(error);
  return (
    <div role="alert" className="mx-auto max-w-xl py-12 text-center">
      <h1 className="text-2xl font-bold">{title}</h1>
      <p className="mt-3 text-graphite-600">{action}</p>
      {reference && <p className="mt-2 text-sm text-graphite-600">{reference}</p>}
      <div className="mt-6 flex flex-wrap justify-center gap-3">
        <Button onClick={() => window.location.reload()}>Reload page</Button>
        {/* A full page load, so a broken app state cannot follow the person home. */}
        <a href="/" className={buttonClasses('secondary')}>
          Go to home
        </a>
      </div>
    </div>
  );
}

/** Last-resort boundary for anything outside the signed-in layout. */
export function RootRouteError() {
  return (
    <main id="main" className="px-4">
      <title>Something went wrong · Keybed</title>
      <PageRouteError />
    </main>
  );
}
