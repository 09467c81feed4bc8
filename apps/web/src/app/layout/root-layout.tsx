import { useEffect, useRef } from 'react';
import { Outlet, ScrollRestoration, useLocation } from 'react-router-dom';

/**
 * After each in-app navigation, focus moves to the new page's heading so screen reader and
 * keyboard users start from the top of the new content, as they would after a full page load.
 */
function useFocusHeadingOnNavigate() {
  const { pathname } = useLocation();
  const isFirstRender = useRef(true);
  useEffect(() => {
    if (isFirstRender.current) {
      isFirstRender.current = false;
      return;
    }
    const heading = document.querySelector<HTMLElement>('main h1');
    if (!heading) return;
    heading.tabIndex = -1;
    heading.focus({ preventScroll: true });
  }, [pathname]);
}

export function RootLayout() {
  useFocusHeadingOnNavigate();
  return (
    <>
      <ScrollRestoration />
      <Outlet />
    </>
  );
}
