import { useEffect } from 'react';
import { WallScreen } from '@/features/wall/components/wall-screen';

export function Component() {
  return (
    <>
      <title>Wall screen · Keybed</title>
      <WallScreen />
    </>
  );
}

const RELOAD_AFTER_MS = 30_000;

/** Nobody may be at the wall to press a button: after a fault the screen reloads itself. */
export function ErrorBoundary() {
  useEffect(() => {
    const timer = setTimeout(() => window.location.reload(), RELOAD_AFTER_MS);
    return () => clearTimeout(timer);
  }, []);
  return (
    <main className="flex min-h-dvh items-center justify-center bg-paper p-8 text-ink">
      <div role="alert" className="max-w-3xl space-y-6 text-center">
        <h1 className="text-wall font-bold">The wall screen stopped working</h1>
        <p className="text-wall-sm">It starts again by itself in half a minute. Actions waiting on it are kept.</p>
        <button type="button" onClick={() => window.location.reload()} className="min-h-16 rounded-xl bg-walnut px-8 text-wall-sm font-bold text-white">
          Start it again now
        </button>
      </div>
    </main>
  );
}
