import { Alert } from '@/components/ui/alert';
import { Card, CardHeader } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { InviteForm } from '@/features/invitations/components/invite-form';
import { PendingInvitations } from '@/features/invitations/components/pending-invitations';
import { useCurrentUser } from '../session';

export function CoachInvitationsRoute() {
  const me = useCurrentUser();
  const canInvite = me.abilities.invite.length > 0;

  return (
    <>
      <title>Invitations · Driftmark</title>
      <PageHeader
        eyebrow={me.team.name}
        title="Invitations"
        description={
          me.role === 'owner'
            ? 'Invite athletes, coaches and assistant coaches. Each gets an e-mail with a link that creates their account.'
            : 'Invite athletes. Each gets an e-mail with a link that creates their account and opens the intake.'
        }
      />
      {canInvite ? (
        <div className="max-w-3xl space-y-8">
          <Card aria-labelledby="invite-heading">
            <CardHeader id="invite-heading" title="Invite someone" />
            <InviteForm actor={{ id: me.id, role: me.role }} roles={me.abilities.invite} />
          </Card>
          <PendingInvitations timeZone={me.timeZone} />
        </div>
      ) : (
        <Alert tone="info" title="Assistant coaches do not send invitations." className="max-w-2xl">
          Ask your head coach to invite athletes; when an athlete is shared with you, they appear on your
          roster.
        </Alert>
      )}
    </>
  );
}
