import { Link } from 'react-router';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';
import { Card } from '@/components/ui/page';

export function Component() {
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-1 text-2xl font-bold text-cellar-900">Forgot your password?</h1>
      <p className="mb-4 text-ink-soft">Enter the e-mail address of your account and we will send you a link to choose a new password.</p>
      <Card>
        <ForgotPasswordForm />
      </Card>
      <p className="mt-4 text-center text-ink-soft">
        Remembered it?{' '}
        <Link to="/sign-in" className="font-semibold text-cellar-700 underline">
          Sign in
        </Link>
      </p>
    </div>
  );
}
