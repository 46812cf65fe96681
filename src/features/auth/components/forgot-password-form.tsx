import { Form, Formik } from 'formik';
import { useState } from 'react';
import { passwordResetRequestSchema, type PasswordResetRequestInput } from '@shared/schemas/password-reset';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { SaveNotice } from '@/components/ui/save-notice';

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const [done, setDone] = useState<string | null>(null);
  return (
    <Formik<PasswordResetRequestInput>
      initialValues={{ email: '' }}
      validate={zodValidate(passwordResetRequestSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          setDone((await request.mutateAsync(values)).message);
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} keptNote="" />
          {done && (
            <Notice tone="success" title="Check your e-mail">
              {done}
            </Notice>
          )}
          <TextField name="email" type="email" label="E-mail" autoComplete="email" inputMode="email" />
          <Button type="submit" busy={isSubmitting} className="w-full">
            {done ? 'Send another link' : 'Send me a link'}
          </Button>
        </Form>
      )}
    </Formik>
  );
}
