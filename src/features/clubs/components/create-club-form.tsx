import { Form, Formik } from 'formik';
import { createClubSchema, type ClubDetail, type CreateClubInput } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useCreateClub } from '../api/create-club';
import { TextAreaField } from '@/components/ui/text-area-field';
import { SaveNotice } from '@/components/ui/save-notice';

export function CreateClubForm({ onCreated }: { onCreated: (club: ClubDetail) => void }) {
  const create = useCreateClub();
  return (
    <Formik<CreateClubInput>
      initialValues={{ name: '', description: '' }}
      validate={zodValidate(createClubSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          onCreated(await create.mutateAsync(values));
        } catch (error) {
          // What was typed stays in the form; pressing the button again retries.
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} />
          <TextField name="name" label="Club name" autoComplete="off" />
          <TextAreaField name="description" label="About the club (optional)" hint="Where and when you meet, what you brew." />
          <Button type="submit" busy={isSubmitting}>
            Start the club
          </Button>
        </Form>
      )}
    </Formik>
  );
}
