import { Form, Formik } from 'formik';
import { updateClubSchema, type ClubDetail } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useUpdateClub } from '../api/update-club';
import { TextAreaField } from '@/components/ui/text-area-field';
import { SaveNotice } from '@/components/ui/save-notice';

/** Organisers rename the club and change its description. */
export function ClubDetailsForm({ club, onDone }: { club: ClubDetail; onDone: () => void }) {
  const update = useUpdateClub(club.id);
  return (
    <Formik
      initialValues={{ name: club.name, description: club.description ?? '' }}
      validate={zodValidate(updateClubSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await update.mutateAsync(values);
          onDone();
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} />
          <TextField name="name" label="Club name" autoComplete="off" />
          <TextAreaField name="description" label="About the club" />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" busy={isSubmitting}>
              Save
            </Button>
            <Button variant="secondary" onClick={onDone}>
              Cancel
            </Button>
          </div>
        </Form>
      )}
    </Formik>
  );
}
