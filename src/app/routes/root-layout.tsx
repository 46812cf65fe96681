import { Menu, X } from 'lucide-react';
import { lazy, Suspense, useEffect, useRef, useState } from 'react';
import { Link, NavLink, Outlet, useLocation, useNavigate, useNavigation } from 'react-router';
import { useMe } from '@/lib/auth';
import { UpdatePrompt } from '@/components/offline/update-prompt';
import { buttonClass } from '@/components/ui/button';
import { Loading } from '@/components/ui/page';
import { navItems } from '../nav';

// A signed-in brewer's header parts, one chunk fetched only once someone is signed in.
const signedIn = () => import('../signed-in-header');
const OfflineSync = lazy(() => signedIn().then((m) => ({ default: m.OfflineSync })));
const QueueCount = lazy(() => signedIn().then((m) => ({ default: m.QueueCount })));
const PreferencesMenu = lazy(() => signedIn().then((m) => ({ default: m.PreferencesMenu })));

export function RootLayout() {
  const { data: me } = useMe();
  const navigate = useNavigate();
  const navigation = useNavigation();
  const items = navItems.filter((i) => (me || i.public) && (!i.admin || me?.siteRole === 'admin'));
  // On a phone the sections fold behind one button, so every page keeps its height for the work.
  // It is open for the page it was opened on, so following a link closes it.
  const location = useLocation();
  const [openOn, setOpenOn] = useState<string | null>(null);
  const menuOpen = openOn === location.pathname;
  const menuButton = useRef<HTMLButtonElement>(null);
  // Escape folds the open menu and puts focus back on its button, wherever focus was inside it.
  useEffect(() => {
    if (!menuOpen) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      setOpenOn(null);
      menuButton.current?.focus();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [menuOpen]);
  return (
    <div className="flex min-h-screen flex-col">
      <header className="no-print bg-cellar-700 text-white">
        <div className="mx-auto flex max-w-5xl items-center gap-2 px-3 py-1 sm:px-6">
          <Link to="/" className="flex min-h-touch items-center gap-2 text-xl font-bold tracking-tight">
            <img src="/favicon.svg" alt="" className="size-7" />
            Wortwise
          </Link>
          <div className="ml-auto flex items-center gap-1">
            {me && (
              <Suspense fallback={null}>
                <OfflineSync />
                <QueueCount />
              </Suspense>
            )}
            {items.length > 1 && (
              <button
                ref={menuButton}
                type="button"
                aria-expanded={menuOpen}
                aria-controls="main-nav"
                onClick={() => setOpenOn(menuOpen ? null : location.pathname)}
                className="flex min-h-touch min-w-touch items-center justify-center gap-1 rounded-lg px-2 hover:bg-cellar-900 sm:hidden"
              >
                {menuOpen ? <X aria-hidden className="size-6" /> : <Menu aria-hidden className="size-6" />}
                <span className="text-sm font-semibold">Menu</span>
              </button>
            )}
            {me ? (
              <Suspense fallback={null}>
                <PreferencesMenu me={me} onSignedOut={() => navigate('/sign-in')} />
              </Suspense>
            ) : (
              <>
                <Link to="/sign-in" className="flex min-h-touch items-center rounded-lg px-3 hover:bg-cellar-900">
                  Sign in
                </Link>
                <Link to="/sign-up" className={buttonClass('secondary', 'hidden sm:inline-flex')}>
                  Create account
                </Link>
              </>
            )}
          </div>
        </div>
        {items.length > 0 && (
          <nav id="main-nav" aria-label="Main" className={`mx-auto max-w-5xl px-2 pb-2 sm:block sm:px-4 sm:pb-0 ${menuOpen || items.length === 1 ? 'block' : 'hidden'}`}>
            <ul className="grid grid-cols-2 gap-1 sm:flex sm:flex-wrap">
              {items.map(({ to, label, icon: Icon }) => (
                <li key={to}>
                  <NavLink
                    to={to}
                    end={to === '/'}
                    className={({ isActive }) =>
                      `flex min-h-touch items-center gap-1.5 whitespace-nowrap rounded-lg px-3 text-sm font-semibold sm:rounded-b-none sm:rounded-t-lg ${isActive ? 'bg-paper text-cellar-900' : 'text-cellar-100 hover:bg-cellar-900'}`
                    }
                  >
                    <Icon aria-hidden className="size-4" />
                    {label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
        )}
      </header>
      <UpdatePrompt />
      <main className="mx-auto w-full max-w-5xl flex-1 px-3 py-6 sm:px-6" aria-busy={navigation.state === 'loading'}>
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
      <footer className="no-print border-t border-cellar-100 px-3 py-4 text-center text-sm text-ink-faint">
        Wortwise helps you measure and decide; brewing and drinking rules differ by place, so follow your local law.
      </footer>
    </div>
  );
}
