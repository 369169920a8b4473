import { ROLE_LABELS, type InvitationPreview } from '@driftmark/shared';
import { Card } from '@/components/ui/card';
import { formatInstantDate } from '@/lib/format';

/** What the invitee is agreeing to: which team, who asked, in which role. */
export function InvitationPreviewCard({ preview }: { preview: InvitationPreview }) {
  return (
    <Card as="section" aria-label="Invitation" className="mb-6">
      <p className="text-sm text-ink-muted">
        <span className="font-semibold text-ink">{preview.inviterName}</span> invited you to join
      </p>
      <p className="mt-1 text-2xl font-bold tracking-tight text-ink">{preview.teamName}</p>
      <dl className="mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
        <dt className="text-ink-faint">Role</dt>
        <dd className="font-semibold text-ink">{ROLE_LABELS[preview.role]}</dd>
        <dt className="text-ink-faint">E-mail</dt>
        <dd className="break-all text-ink">{preview.email}</dd>
        <dt className="text-ink-faint">Link valid until</dt>
        <dd className="text-ink tabular-nums">{formatInstantDate(preview.expiresAt)}</dd>
      </dl>
    </Card>
  );
}
