import { QueryClientProvider } from '@tanstack/react-query';
import { FlaskConical } from 'lucide-react';
import { useEffect, useState } from 'react';
import { registerSW } from 'virtual:pwa-register';
import { mainClass, MainNav, navItemClass, SignedOutLinks, SiteFooter, SiteHeader, type PageLink } from '@/components/ui/site-frame';
import { PublicCheck } from '@/features/late-boil/components/public-check';
import { createQueryClient } from '@/lib/query-client';

/** Links into the app: a full page load, which the app's own page answers. */
const PlainLink: PageLink = ({ to, className, children }) => (
  <a href={to} className={className}>
    {children}
  </a>
);

/** The frame of a signed-out app page around the public check (src/public-check.tsx). */
export function PublicCheckPage() {
  const [queryClient] = useState(createQueryClient);
  useEffect(() => {
    if ('serviceWorker' in navigator) void registerSW({ immediate: true });
  }, []);
  return (
    <QueryClientProvider client={queryClient}>
      <div className="flex min-h-screen flex-col">
        <SiteHeader
          Link={PlainLink}
          actions={<SignedOutLinks Link={PlainLink} />}
          nav={
            <MainNav shown>
              <li>
                <a href="/late-boil-check" aria-current="page" className={navItemClass(true)}>
                  <FlaskConical aria-hidden className="size-4" />
                  Late-boil check
                </a>
              </li>
            </MainNav>
          }
        />
        <main className={mainClass}>
          <PublicCheck Link={PlainLink} />
        </main>
        <SiteFooter />
      </div>
    </QueryClientProvider>
  );
}
