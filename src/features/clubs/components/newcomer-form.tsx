import { Form, Formik } from 'formik';
import { newcomerSchema, type NewcomerInput } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { SaveNotice } from '@/components/ui/save-notice';

/**
 * Creates the account for the invited address and joins the club, in one step. The page owns the
 * acceptance (`onSubmit`), so it can stop asking about the invitation while it is being used.
 */
export function NewcomerForm({ email, clubName, onSubmit }: { email: string; clubName: string; onSubmit: (values: NewcomerInput) => Promise<unknown> }) {
  return (
    <Formik<NewcomerInput>
      initialValues={{ displayName: '', password: '' }}
      validate={zodValidate(newcomerSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await onSubmit(values);
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} />
          <div>
            <p className="mb-1 text-sm font-semibold text-ink-soft">E-mail</p>
            <p className="break-all text-ink">{email}</p>
          </div>
          <TextField name="displayName" label="Your name" autoComplete="name" hint="Shown to the club's mentors and members." />
          <TextField name="password" type="password" label="Password" autoComplete="new-password" hint="At least 10 characters." />
          <Button type="submit" busy={isSubmitting} className="w-full">
            Create my account and join {clubName}
          </Button>
        </Form>
      )}
    </Formik>
  );
}
