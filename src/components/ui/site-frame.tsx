/**
 * The pieces of the page frame every Wortwise page shows, whichever way it is served: the app's
 * layout (src/app/routes/root-layout.tsx) and the public check's own page (src/public-check.tsx)
 * render the same brand, header links, navigation tabs and footer from here.
 */
import { buttonClass } from './button';

export const headerClass = 'no-print bg-cellar-700 text-white';
export const headerBarClass = 'mx-auto flex max-w-5xl items-center gap-2 px-3 py-1 sm:px-6';
export const brandClass = 'flex min-h-touch items-center gap-2 text-xl font-bold tracking-tight';
export const signInClass = 'flex min-h-touch items-center rounded-lg px-3 hover:bg-cellar-900';
export const createAccountClass = buttonClass('secondary', 'hidden sm:inline-flex');
export const navClass = 'mx-auto max-w-5xl px-2 pb-2 sm:block sm:px-4 sm:pb-0';
export const navListClass = 'grid grid-cols-2 gap-1 sm:flex sm:flex-wrap';
export const mainClass = 'mx-auto w-full max-w-5xl flex-1 px-3 py-6 sm:px-6';

/** A tab of the main navigation, marked when it is the page being shown. */
export const navItemClass = (active: boolean) =>
  `flex min-h-touch items-center gap-1.5 whitespace-nowrap rounded-lg px-3 text-sm font-semibold sm:rounded-b-none sm:rounded-t-lg ${active ? 'bg-paper text-cellar-900' : 'text-cellar-100 hover:bg-cellar-900'}`;

/** The logo and name inside the link home. */
export function Brand() {
  return (
    <>
      <img src="/favicon.svg" alt="" className="size-7" />
      Wortwise
    </>
  );
}

export function SiteFooter() {
  return (
    <footer className="no-print border-t border-cellar-100 px-3 py-4 text-center text-sm text-ink-faint">
      Wortwise helps you measure and decide; brewing and drinking rules differ by place, so follow your local law.
    </footer>
  );
}
