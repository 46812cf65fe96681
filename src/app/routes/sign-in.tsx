import { Link, useNavigate, useSearchParams } from 'react-router';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { Card } from '@/components/ui/page';
import { safeNext } from '../guards';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-4 text-2xl font-bold text-cellar-900">Sign in to Wortwise</h1>
      <Card>
        <SignInForm onSignedIn={() => navigate(safeNext(params.get('next')), { replace: true })} />
      </Card>
      <p className="mt-4 text-center text-ink-soft">
        New here?{' '}
        <Link to="/sign-up" className="font-semibold text-cellar-700 underline">
          Create an account
        </Link>
      </p>
      <p className="mt-2 text-center text-ink-soft">
        Or try the{' '}
        <Link to="/late-boil-check" className="font-semibold text-cellar-700 underline">
          late-boil check
        </Link>{' '}
        without an account.
      </p>
    </div>
  );
}
