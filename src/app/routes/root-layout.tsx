import { Menu, X } from 'lucide-react';
import { lazy, Suspense, useEffect, useRef, useState } from 'react';
import { NavLink, Outlet, useLocation, useNavigate, useNavigation } from 'react-router';
import { useMe } from '@/lib/auth';
import { UpdatePrompt } from '@/components/offline/update-prompt';
import { Loading } from '@/components/ui/page';
import { mainClass, MainNav, navItemClass, SignedOutLinks, SiteFooter, SiteHeader } from '@/components/ui/site-frame';
import { RouterLink } from '@/components/ui/router-link';
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
      <SiteHeader
        Link={RouterLink}
        actions={
          <>
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
              <SignedOutLinks Link={RouterLink} />
            )}
          </>
        }
        nav={
          items.length > 0 && (
            <MainNav shown={menuOpen || items.length === 1}>
              {items.map(({ to, label, icon: Icon }) => (
                <li key={to}>
                  <NavLink to={to} end={to === '/'} className={({ isActive }) => navItemClass(isActive)}>
                    <Icon aria-hidden className="size-4" />
                    {label}
                  </NavLink>
                </li>
              ))}
            </MainNav>
          )
        }
      />
      <UpdatePrompt />
      <main className={mainClass} aria-busy={navigation.state === 'loading'}>
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
      <SiteFooter />
    </div>
  );
}
