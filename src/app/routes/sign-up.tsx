import { Link, useNavigate } from 'react-router';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { Card } from '@/components/ui/page';

export function Component() {
  const navigate = useNavigate();
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-1 text-2xl font-bold text-cellar-900">Create your Wortwise account</h1>
      <p className="mb-4 text-ink-soft">Keep your recipes, log every reading on brew day and share the log with your club's mentor.</p>
      <Card>
        <SignUpForm onSignedUp={() => navigate('/', { replace: true, state: { firstVisit: true } })} />
      </Card>
      <p className="mt-4 text-center text-ink-soft">
        Already brewing with us?{' '}
        <Link to="/sign-in" className="font-semibold text-cellar-700 underline">
          Sign in
        </Link>
      </p>
    </div>
  );
}
