import { LogoMark } from '@/components/logo';
import { NotFoundContent } from '../layout/not-found-content';

export function Component() {
  return (
    <>
      <title>Page not found · Keybed</title>
      <header className="px-4 py-5 sm:px-8">
        <p className="flex items-center gap-2 text-lg font-bold">
          <LogoMark className="text-ink" />
          Keybed
        </p>
      </header>
      <main id="main" className="px-4">
        <NotFoundContent />
      </main>
    </>
  );
}
