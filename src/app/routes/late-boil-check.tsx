import { Link } from 'react-router';
import { PublicCheck, type PageLink } from '@/features/late-boil/components/public-check';

/** Links followed by the router: the check opened from inside the app. */
const RouterLink: PageLink = ({ to, className, children }) => (
  <Link to={to} className={className}>
    {children}
  </Link>
);

export function Component() {
  return <PublicCheck Link={RouterLink} />;
}
