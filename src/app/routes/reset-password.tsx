import { useNavigate, useParams } from 'react-router';
import { useResetLink } from '@/features/auth/api/reset-password';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { Button } from '@/components/ui/button';
import { ButtonLink } from '@/components/ui/button-link';
import { Notice } from '@/components/ui/notice';
import { Card, Loading } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';

export function Component() {
  const token = useParams().token ?? '';
  const link = useResetLink(token);
  const navigate = useNavigate();
  if (link.isPending) return <Loading label="Checking the link…" />;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-4 text-2xl font-bold text-cellar-900">Choose a new password</h1>
      {link.error ? (
        <>
          <Notice tone="error">{link.error.message}</Notice>
          <div className="mt-4 flex flex-wrap gap-2">
            {link.error instanceof ApiError && (link.error.status === 404 || link.error.status === 410) ? (
              <ButtonLink to="/forgot-password">Ask for a new link</ButtonLink>
            ) : (
              <Button busy={link.isRefetching} onClick={() => link.refetch()}>
                Try again
              </Button>
            )}
          </div>
        </>
      ) : (
        <Card>
          <ResetPasswordForm token={token} onDone={() => navigate('/', { replace: true })} />
        </Card>
      )}
    </div>
  );
}
