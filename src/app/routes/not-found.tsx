import { ButtonLink } from '@/components/ui/button-link';

export function Component() {
  return (
    <div className="py-16 text-center">
      <p className="text-6xl font-bold text-malt-500">404</p>
      <h1 className="mt-2 text-2xl font-bold text-cellar-900">Nothing in this fermenter</h1>
      <p className="mt-2 text-ink-soft">The page you asked for does not exist, or it is not shared with you.</p>
      <ButtonLink to="/" className="mt-6">
        Back to Wortwise
      </ButtonLink>
    </div>
  );
}
