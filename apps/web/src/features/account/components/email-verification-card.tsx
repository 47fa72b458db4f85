import { Alert, Badge, Button, Card, CardHeader } from '@demandscape/ui';
import type { User } from '../../../types/api';
import { useResendVerification } from '../api/resend-verification';

/**
 * The e-mail address, whether it is verified, and a button to send a new verification link.
 * @param props the signed-in user
 * @returns a card
 * @example <EmailVerificationCard user={me.user} />
 */
export function EmailVerificationCard({ user }: { user: User }) {
  const mutation = useResendVerification();
  return (
    <Card>
      <CardHeader
        title="E-mail address"
        description="Used to sign in and for password-reset links."
        actions={user.emailVerified ? <Badge tone="success">Verified</Badge> : <Badge tone="caution">Not verified</Badge>}
      />
      <div className="flex flex-col gap-4 p-5">
        <p className="text-sm font-medium text-ink">{user.email}</p>
        {user.emailVerified ? null : (
          <>
            <p className="text-sm text-ink-muted">
              We sent a link to this address when you signed up. Open it to confirm the address belongs to you.
            </p>
            {mutation.isSuccess ? (
              <Alert tone="success">A new link is on its way to {user.email}.</Alert>
            ) : null}
            <div>
              <Button variant="secondary" onClick={() => mutation.mutate()} isLoading={mutation.isPending}>
                Send a new verification link
              </Button>
            </div>
          </>
        )}
      </div>
    </Card>
  );
}
