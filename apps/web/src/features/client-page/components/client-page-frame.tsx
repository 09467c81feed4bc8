import type { ReactNode } from 'react';

/** The client's page has no app navigation: the workshop's name at the top, the content, a quiet footer. */
export function ClientPageFrame({ workshopName, children }: { workshopName: string | null; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b-4 border-spruce bg-ink text-paper">
        <div className="mx-auto max-w-6xl px-4 py-4 sm:px-6">
          <p className="text-xl font-bold sm:text-2xl">{workshopName ?? 'Your estimate'}</p>
          {workshopName && <p className="text-sm text-graphite-300">Piano restoration estimate</p>}
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:px-6 sm:py-8">{children}</main>
      <footer className="border-t border-graphite-300 px-4 py-4 text-center text-sm text-graphite-600">
        This page is private to you. Please do not forward its link.
      </footer>
    </div>
  );
}
