/**
 * The frame every Wortwise page shows, whichever way it is served: the app's layout
 * (src/app/routes/root-layout.tsx) and the public check's own page (src/app/public-check-page.tsx)
 * render the same header, sign-in links, navigation tabs and footer from here. Each passes the
 * link it follows pages with: the router's, or a plain one.
 */
import type { ComponentType, ReactNode } from 'react';
import { buttonClass } from './button';

/** A link to one of the app's pages, as the page showing it follows links. */
export type PageLink = ComponentType<{ to: string; className?: string; children: ReactNode }>;

export const mainClass = 'mx-auto w-full max-w-5xl flex-1 px-3 py-6 sm:px-6';

/** A tab of the main navigation, marked when it is the page being shown. */
export const navItemClass = (active: boolean) =>
  `flex min-h-touch items-center gap-1.5 whitespace-nowrap rounded-lg px-3 text-sm font-semibold sm:rounded-b-none sm:rounded-t-lg ${active ? 'bg-paper text-cellar-900' : 'text-cellar-100 hover:bg-cellar-900'}`;

/** The bar with the logo (a link home) and `actions` at its end, and the main navigation below it. */
export function SiteHeader({ Link, actions, nav }: { Link: PageLink; actions: ReactNode; nav?: ReactNode }) {
  return (
    <header className="no-print bg-cellar-700 text-white">
      <div className="mx-auto flex max-w-5xl items-center gap-2 px-3 py-1 sm:px-6">
        <Link to="/" className="flex min-h-touch items-center gap-2 text-xl font-bold tracking-tight">
          <img src="/favicon.svg" alt="" className="size-7" />
          Wortwise
        </Link>
        <div className="ml-auto flex items-center gap-1">{actions}</div>
      </div>
      {nav}
    </header>
  );
}

/** What a visitor who is not signed in sees at the end of the bar. */
export function SignedOutLinks({ Link }: { Link: PageLink }) {
  return (
    <>
      <Link to="/sign-in" className="flex min-h-touch items-center rounded-lg px-3 hover:bg-cellar-900">
        Sign in
      </Link>
      <Link to="/sign-up" className={buttonClass('secondary', 'hidden sm:inline-flex')}>
        Create account
      </Link>
    </>
  );
}

/** The main navigation's list of tabs; on a phone `shown` says whether it is unfolded. */
export function MainNav({ shown, children }: { shown: boolean; children: ReactNode }) {
  return (
    <nav id="main-nav" aria-label="Main" className={`mx-auto max-w-5xl px-2 pb-2 sm:block sm:px-4 sm:pb-0 ${shown ? 'block' : 'hidden'}`}>
      <ul className="grid grid-cols-2 gap-1 sm:flex sm:flex-wrap">{children}</ul>
    </nav>
  );
}

export function SiteFooter() {
  return (
    <footer className="no-print border-t border-cellar-100 px-3 py-4 text-center text-sm text-ink-faint">
      Wortwise helps you measure and decide; brewing and drinking rules differ by place, so follow your local law.
    </footer>
  );
}
