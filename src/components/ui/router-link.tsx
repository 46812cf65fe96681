import { Link } from 'react-router';
import type { PageLink } from './site-frame';

/** Links followed by the router, for the parts shared with the public check's own page. */
export const RouterLink: PageLink = ({ to, className, children }) => (
  <Link to={to} className={className}>
    {children}
  </Link>
);
