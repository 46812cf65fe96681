import { Form, Formik } from 'formik';
import { useState } from 'react';
import { inviteSchema, type InvitationSent, type InviteInput } from '@shared/schemas/clubs';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { applyApiError, zodValidate } from '@/lib/form';
import { useInviteMember } from '../api/invite-member';
import { RoleField } from './role-select';
import { roleHints, formatDay } from './role-words';
import { SaveNotice } from '@/components/ui/save-notice';

export function InviteForm({ clubId }: { clubId: number }) {
  const invite = useInviteMember(clubId);
  const [sent, setSent] = useState<InvitationSent | null>(null);
  return (
    <Formik<InviteInput>
      initialValues={{ email: '', role: 'member' }}
      validate={zodValidate(inviteSchema)}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        setSent(null);
        try {
          setSent(await invite.mutateAsync(values));
          helpers.resetForm();
        } catch (error) {
          applyApiError(error, helpers);
        }
      }}
    >
      {({ isSubmitting, status, values }) => (
        <Form noValidate className="space-y-4">
          <SaveNotice failure={status} />
          {sent &&
            (sent.mailSent ? (
              <Notice tone="success">
                Invitation sent to {sent.invitation.email}. The link works once, until {formatDay(sent.invitation.expiresAt)}.
              </Notice>
            ) : (
              <Notice tone="caution" title="Invitation saved, but the e-mail did not go out">
                Use “Send again” below in a little while.
              </Notice>
            ))}
          <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
            <TextField name="email" type="email" label="E-mail address" autoComplete="off" inputMode="email" />
            <RoleField name="role" label="Joins as" />
          </div>
          <p className="text-sm text-ink-faint">A {values.role ?? 'member'} {roleHints[values.role ?? 'member']}.</p>
          <Button type="submit" busy={isSubmitting}>
            Send invitation
          </Button>
        </Form>
      )}
    </Formik>
  );
}
