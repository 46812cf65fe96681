import { Form, Formik } from 'formik';
import { Link } from 'react-router';
import { loginSchema, type LoginInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useLogin } from '../api/login';
import { SaveNotice } from '@/components/ui/save-notice';

export function SignInForm({ onSignedIn, initialEmail = '' }: { onSignedIn: () => void; initialEmail?: string }) {
  const login = useLogin();
  return (
    <Formik<LoginInput>
      initialValues={{ email: initialEmail, password: '' }}
      validate={zodValidate(loginSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await login.mutateAsync(values);
          onSignedIn();
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} keptNote="" />
          <TextField name="email" type="email" label="E-mail" autoComplete="email" inputMode="email" />
          <TextField name="password" type="password" label="Password" autoComplete="current-password" />
          <Button type="submit" busy={isSubmitting} className="w-full">
            Sign in
          </Button>
          <p className="text-center">
            <Link to="/forgot-password" className="inline-flex min-h-touch items-center font-semibold text-cellar-700 underline">
              Forgot your password?
            </Link>
          </p>
        </Form>
      )}
    </Formik>
  );
}
