import { Link, useNavigate, useParams } from 'react-router';
import { useLogout } from '@/features/auth/api/logout';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useAcceptInvitation } from '@/features/clubs/api/accept-invitation';
import { useInvitation } from '@/features/clubs/api/get-invitation';
import { InvitationSummary } from '@/features/clubs/components/invitation-summary';
import { NewcomerForm } from '@/features/clubs/components/newcomer-form';
import { Button } from '@/components/ui/button';
import { ButtonLink } from '@/components/ui/button-link';
import { Notice } from '@/components/ui/notice';
import { Card, Loading } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';

/** Where an invitation link lands: join as the signed-in brewer, sign in first, or sign up on the way. */
export function Component() {
  const token = useParams().token ?? '';
  const { data: me } = useMe();
  const accept = useAcceptInvitation(token);
  const accepting = accept.isPending || accept.isSuccess;
  const { data: invitation, error, isPending, refetch, isRefetching } = useInvitation(token, !accepting);
  const logout = useLogout();
  const navigate = useNavigate();
  const joined = (clubId: number) => navigate(`/clubs/${clubId}`, { replace: true });

  // While accepting, the forms stay on screen (a failure keeps what was typed); once accepted, the
  // cache is reset for the new session and the page moves on to the club.
  if (accept.isSuccess) return <Loading label="Joining the club…" />;
  if (isPending) return <Loading label="Opening the invitation…" />;
  if (error) {
    const final = error instanceof ApiError && (error.status === 404 || error.status === 410);
    return (
      <div className="mx-auto max-w-md">
        <h1 className="mb-4 text-2xl font-bold text-cellar-900">This invitation cannot be used</h1>
        <Notice tone="error">{error.message}</Notice>
        <div className="mt-4 flex flex-wrap gap-2">
          {!final && (
            <Button busy={isRefetching} onClick={() => refetch()}>
              Try again
            </Button>
          )}
          <ButtonLink to={me ? '/clubs' : '/sign-in'} variant="secondary">
            {me ? 'Your clubs' : 'Sign in'}
          </ButtonLink>
        </div>
      </div>
    );
  }

  const isForMe = me && me.email === invitation.email;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-1 text-2xl font-bold text-cellar-900">Join {invitation.clubName}</h1>
      <div className="mb-4">
        <InvitationSummary invitation={invitation} />
      </div>
      {accept.error && (
        <Notice tone="error" className="mb-4">
          {accept.error.message}
        </Notice>
      )}
      <Card>
        {me && isForMe && (
          <Button className="w-full" busy={accept.isPending} onClick={() => accept.mutate(undefined, { onSuccess: (a) => joined(a.clubId) })}>
            Join {invitation.clubName}
          </Button>
        )}
        {me && !isForMe && (
          <div className="space-y-3">
            <Notice tone="caution">
              You are signed in as {me.email}, but this invitation is for {invitation.email}. Sign out to accept it with that address, or ask the
              organiser to invite {me.email}.
            </Notice>
            <Button variant="secondary" busy={logout.isPending} onClick={() => logout.mutate()}>
              Sign out
            </Button>
          </div>
        )}
        {!me && invitation.accountExists && (
          <>
            <p className="mb-4 text-ink-soft">{invitation.email} already has a Wortwise account. Sign in to join.</p>
            <SignInForm
              initialEmail={invitation.email}
              // Signed in: accept straight away rather than asking for a second click.
              onSignedIn={() => accept.mutate(undefined, { onSuccess: (a) => joined(a.clubId) })}
            />
          </>
        )}
        {!me && !invitation.accountExists && (
          <>
            <p className="mb-4 text-ink-soft">
              New to Wortwise? Choose your name and a password; your account is created and you join the club in one step.
            </p>
            <NewcomerForm
              email={invitation.email}
              clubName={invitation.clubName}
              onSubmit={async (values) => joined((await accept.mutateAsync(values)).clubId)}
            />
            <p className="mt-4 text-center text-sm text-ink-soft">
              Wrong address?{' '}
              <Link to="/" className="font-semibold text-cellar-700 underline">
                Leave this page
              </Link>{' '}
              and ask the organiser for a new invitation.
            </p>
          </>
        )}
      </Card>
    </div>
  );
}
