import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** A browser that is not (or is no longer) the wall screen says so, and how to pair it. */
export function WallNotPaired() {
  return (
    <main className="flex min-h-dvh items-center justify-center bg-paper p-8 text-ink">
      <div className="max-w-3xl space-y-6 rounded-xl border-4 border-graphite-300 bg-white p-10">
        <h1 className="text-wall font-bold">This browser is not paired as the wall screen</h1>
        <p className="text-wall-sm">
          An owner or foreman can pair it: sign in on this screen, then choose Pair this browser. Their sign-in ends here, and the screen
          can only show who is working and clock people on and off with their PINs.
        </p>
        <Link to={paths.wallPair.build()} className="inline-flex min-h-16 items-center rounded-xl bg-walnut px-8 text-wall-sm font-bold text-white">
          Pair this browser
        </Link>
      </div>
    </main>
  );
}
