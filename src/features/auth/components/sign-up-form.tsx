import { Form, Formik } from 'formik';
import { signupSchema, type SignupInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useSignup } from '../api/signup';
import { SaveNotice } from '@/components/ui/save-notice';

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signup = useSignup();
  return (
    <Formik<SignupInput>
      initialValues={{ displayName: '', email: '', password: '' }}
      validate={zodValidate(signupSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await signup.mutateAsync(values);
          onSignedUp();
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} keptNote="" />
          <TextField name="displayName" label="Your name" autoComplete="name" hint="Shown to your club's mentors." />
          <TextField name="email" type="email" label="E-mail" autoComplete="email" inputMode="email" />
          <TextField name="password" type="password" label="Password" autoComplete="new-password" hint="At least 10 characters." />
          <Button type="submit" busy={isSubmitting} className="w-full">
            Create my account
          </Button>
        </Form>
      )}
    </Formik>
  );
}
