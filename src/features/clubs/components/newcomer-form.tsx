import { Form, Formik } from 'formik';
import { newcomerSchema, type NewcomerInput } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useAcceptInvitation, type Accepted } from '../api/accept-invitation';

/** Creates the account for the invited address and joins the club, in one step. */
export function NewcomerForm({ token, email, clubName, onJoined }: { token: string; email: string; clubName: string; onJoined: (accepted: Accepted) => void }) {
  const accept = useAcceptInvitation(token);
  return (
    <Formik<NewcomerInput>
      initialValues={{ displayName: '', password: '' }}
      validate={zodValidate(newcomerSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          onJoined(await accept.mutateAsync(values));
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          {status && <Notice tone="error">{status}</Notice>}
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
