import { lazy } from 'react';
import { useMe } from '@/lib/auth';

// Both are their own chunks: a visitor's first page never fetches the signed-in home's code (and
// its brew-day queries), and a brewer's never fetches the front page.
const Home = lazy(() => import('./home').then((m) => ({ default: m.Component })));
const FrontPage = lazy(() => import('./front-page').then((m) => ({ default: m.Component })));

/** `/`: the brewer's home when signed in, otherwise a short page saying what Wortwise is. */
export function IndexPage() {
  const { data: me } = useMe();
  return me ? <Home /> : <FrontPage />;
}
