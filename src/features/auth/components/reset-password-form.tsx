import { Form, Formik } from 'formik';
import { passwordResetFormSchema, type PasswordResetFormInput } from '@shared/schemas/password-reset';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useResetPassword } from '../api/reset-password';
import { SaveNotice } from '@/components/ui/save-notice';

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const reset = useResetPassword(token);
  return (
    <Formik<PasswordResetFormInput>
      initialValues={{ password: '', confirm: '' }}
      validate={zodValidate(passwordResetFormSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await reset.mutateAsync({ password: values.password });
          onDone();
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} keptNote="" />
          <TextField name="password" type="password" label="New password" autoComplete="new-password" hint="At least 10 characters." />
          <TextField name="confirm" type="password" label="New password again" autoComplete="new-password" />
          <p className="text-sm text-ink-faint">Saving signs you out on every other device.</p>
          <Button type="submit" busy={isSubmitting} className="w-full">
            Save my new password
          </Button>
        </Form>
      )}
    </Formik>
  );
}
