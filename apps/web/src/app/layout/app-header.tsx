import type { Me } from '@keybed/shared';
import { Link } from 'react-router-dom';
import { LogoMark } from '@/components/logo';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';
import { ROLE_LABELS } from '@/lib/roles';
import { MainNav } from './main-nav';
import { SignOutButton } from './sign-out-button';

/** `isWide` lines the header up with full-width pages (the board). */
export function AppHeader({ me, isWide = false }: { me: Me; isWide?: boolean }) {
  return (
    <header className="bg-ink text-paper">
      <div className={cx('mx-auto flex flex-wrap items-center', !isWide && 'max-w-7xl', 'gap-x-6 gap-y-1 px-4 pt-2 sm:px-6 lg:px-8')}>
        <div className="order-1 flex min-w-0 flex-1 items-center gap-3 py-1">
          <LogoMark className="text-graphite-700" />
          <div className="min-w-0">
            <Link to={paths.home.build()} className="block text-lg leading-tight font-bold hover:underline">
              {me.workshop.name}
            </Link>
            <p className="truncate text-xs text-graphite-300">
              <Link to={paths.profile.build()} className="underline-offset-2 hover:underline sm:hidden">
                {me.user.name} · {ROLE_LABELS[me.role]}
              </Link>
              <span className="hidden sm:inline">Keybed</span>
            </p>
          </div>
        </div>
        {/* Its own row: with every page an owner uses, the items no longer fit beside the name. */}
        <MainNav role={me.role} className="order-3 w-full" />
        <div className="order-2 flex items-center gap-3">
          <Link to={paths.profile.build()} className="hidden text-right text-sm leading-tight hover:underline sm:block">
            <span className="sr-only">Your profile: </span>
            <span className="block font-semibold">{me.user.name}</span>
            <span className="block text-graphite-300">{ROLE_LABELS[me.role]}</span>
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
