import { Field, Form, Formik } from 'formik';
import { RotateCcw, Send } from 'lucide-react';
import { useId, useState } from 'react';
import { z } from 'zod';
import { commentBodySchema, COMMENT_MAX_CHARS, type CommentTargetInput } from '@shared/schemas/comments';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NetworkError } from '@/lib/api-client';
import { applyApiError, zodValidate } from '@/lib/form';
import { useAddComment } from '../api/add-comment';
import { SaveNotice } from '@/components/ui/save-notice';

const formSchema = z.object({ body: commentBodySchema });

/**
 * A comment box. A save that never reached the server keeps the text and offers a retry; a refusal
 * (the brew day was unshared a moment ago) keeps the text and says why.
 */
export function CommentForm({
  brewId,
  target,
  label,
  submitLabel = 'Post comment',
  onPosted,
  onCancel,
  autoFocus = false,
}: {
  brewId: number;
  target: CommentTargetInput | null;
  label: string;
  submitLabel?: string;
  onPosted?: (noticeSent: boolean | null) => void;
  onCancel?: () => void;
  autoFocus?: boolean;
}) {
  const add = useAddComment(brewId);
  const [offline, setOffline] = useState(false);
  const [posted, setPosted] = useState<string | null>(null);
  const id = useId();
  return (
    <Formik<{ body: string }>
      initialValues={{ body: '' }}
      validate={zodValidate(formSchema)}
      validateOnBlur={false}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setOffline(false);
        setPosted(null);
        try {
          const created = await add.mutateAsync({ body: values.body, target });
          helpers.resetForm({ values: { body: '' } });
          setPosted(created.noticeSent === false ? 'Comment posted. The brewer’s e-mail could not be sent; they will see it on their log.' : 'Comment posted.');
          onPosted?.(created.noticeSent);
        } catch (error) {
          if (error instanceof NetworkError) setOffline(true);
          else applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status, errors, touched, values, submitForm }) => (
        <Form noValidate aria-label={label} className="space-y-2">
          <label htmlFor={id} className="block text-sm font-semibold text-ink-soft">
            {label}
          </label>
          <Field
            as="textarea"
            id={id}
            name="body"
            rows={3}
            autoFocus={autoFocus}
            aria-invalid={Boolean(touched.body && errors.body) || undefined}
            aria-describedby={touched.body && errors.body ? `${id}-error` : undefined}
            className={`block w-full rounded-lg border bg-white px-3 py-2 text-base ${touched.body && errors.body ? 'border-alert-500' : 'border-cellar-300'}`}
          />
          {values.body.length > COMMENT_MAX_CHARS * 0.9 && (
            <p className="text-sm text-ink-faint">
              {values.body.length} of {COMMENT_MAX_CHARS} characters
            </p>
          )}
          {touched.body && errors.body && (
            <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-alert-700">
              {errors.body}
            </p>
          )}
          <SaveNotice failure={status} />
          {offline && (
            <Notice tone="error" title="Not posted — no connection">
              Your comment is still here. Check the connection, then try again.
            </Notice>
          )}
          <div className="flex flex-wrap gap-2">
            <Button
              type={offline ? 'button' : 'submit'}
              onClick={offline ? () => void submitForm() : undefined}
              busy={isSubmitting}
              icon={offline ? <RotateCcw aria-hidden className="size-5" /> : <Send aria-hidden className="size-5" />}
              className="flex-1 sm:flex-none"
            >
              {offline ? 'Retry' : submitLabel}
            </Button>
            {onCancel && (
              <Button variant="quiet" onClick={onCancel}>
                Cancel
              </Button>
            )}
          </div>
          {posted && <Notice tone="success">{posted}</Notice>}
        </Form>
      )}
    </Formik>
  );
}
