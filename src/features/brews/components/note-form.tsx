import { Field, Form, Formik } from 'formik';
import { useState } from 'react';
import { brewNoteInputSchema, type BrewNoteInput, type BrewStage } from '@shared/schemas/brews';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NetworkError } from '@/lib/api-client';
import { applyApiError, zodValidate } from '@/lib/form';
import { useAddNote } from '../api/add-note';
import { NotSaved } from './not-saved';
import { SaveNotice } from '@/components/ui/save-notice';

/** A free note in the log, tied to the stage it was written in. */
export function NoteForm({ brewId, stage }: { brewId: number; stage: BrewStage | null }) {
  const add = useAddNote(brewId);
  const [offline, setOffline] = useState(false);
  const [saved, setSaved] = useState<'sent' | 'queued' | null>(null);
  return (
    <Formik<BrewNoteInput>
      initialValues={{ body: '', stage }}
      validate={zodValidate(brewNoteInputSchema)}
      validateOnBlur={false}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setOffline(false);
        setSaved(null);
        try {
          const outcome = await add.mutateAsync({ ...values, stage });
          helpers.resetForm({ values: { body: '', stage } });
          setSaved(outcome.status === 'queued' ? 'queued' : 'sent');
        } catch (error) {
          if (error instanceof NetworkError) setOffline(true);
          else applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status, errors, touched, submitForm }) => (
        <Form noValidate aria-label="Add a note" className="no-print space-y-2 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
          <label className="block">
            <span className="mb-1 block font-bold text-cellar-900">Add a note to the log</span>
            <Field
              as="textarea"
              name="body"
              rows={2}
              aria-invalid={Boolean(touched.body && errors.body) || undefined}
              className="block w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base"
            />
          </label>
          {touched.body && errors.body && (
            <p role="alert" className="text-sm font-semibold text-alert-700">
              {errors.body}
            </p>
          )}
          <SaveNotice failure={status} />
          {offline ? (
            <NotSaved busy={isSubmitting} onRetry={() => void submitForm()} />
          ) : (
            <Button type="submit" variant="secondary" busy={isSubmitting} className="w-full">
              Save note
            </Button>
          )}
          {saved && <Notice tone="success">{saved === 'queued' ? 'Note kept on this device: waiting to send.' : 'Note saved.'}</Notice>}
        </Form>
      )}
    </Formik>
  );
}
