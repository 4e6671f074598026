import { useEffect, useRef, type ReactNode } from 'react';
import { useLocation } from 'react-router';
import { SiteFooter } from './site-footer';
import { SiteHeader } from './site-header';

/**
 * The page shell: skip link, header, main landmark, footer. After an in-app navigation, focus
 * moves to the main landmark so keyboard and screen-reader users start at the new content.
 */
export function Layout({ children }: { children: ReactNode }) {
  const { pathname } = useLocation();
  const main = useRef<HTMLElement>(null);
  const firstPath = useRef(pathname);

  useEffect(() => {
    if (pathname === firstPath.current) return;
    firstPath.current = '';
    main.current?.focus({ preventScroll: true });
  }, [pathname]);

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="absolute top-2 left-2 z-50 -translate-y-24 rounded-md bg-moss px-4 py-2 font-bold text-card no-underline focus:translate-y-0 hover:text-card"
      >
        Skip to main content
      </a>
      <SiteHeader />
      <main id="main" ref={main} tabIndex={-1} className="flex-1 outline-none">
        {children}
      </main>
      <SiteFooter />
    </div>
  );
}
