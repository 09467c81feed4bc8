import { Outlet } from 'react-router-dom';
import { LogoMark } from '@/components/logo';

/** Pages for people who are not signed in: one narrow card, nothing else to distract. */
export function Component() {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="px-4 py-5 sm:px-8">
        <p className="flex items-center gap-2 text-lg font-bold">
          <LogoMark className="text-ink" />
          Keybed
        </p>
      </header>
      <main id="main" className="flex flex-1 items-start justify-center px-4 pb-12 sm:pt-8">
        <div className="w-full max-w-md rounded-lg border border-graphite-300 bg-white p-6 shadow-sm sm:p-8">
          <Outlet />
        </div>
      </main>
    </div>
  );
}
