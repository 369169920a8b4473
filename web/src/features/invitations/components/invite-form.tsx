import {
  createInvitationRequest,
  LIMITS,
  ROLE_LABELS,
  type CreateInvitationRequest,
  type InvitableRole,
  type Role,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { useCreateInvitation } from '../api/create-invitation';
import { useTeamMembers } from '../api/get-team-members';

interface InviteFormProps {
  actor: { id: string; role: Role };
  /** Roles the server lets this user invite (from /api/me abilities). */
  roles: readonly InvitableRole[];
}

const ROLE_HINTS: Record<string, string> = {
  athlete: 'Athletes fill in an intake, then log their days and read their targets.',
  coach: 'Coaches run their own athletes and invite athletes.',
  assistant: 'Assistant coaches work on the athletes a coach shares with them.',
};

export function InviteForm({ actor, roles }: InviteFormProps) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<CreateInvitationRequest>({
    resolver: zodResolver(createInvitationRequest),
    defaultValues: { name: '', email: '', role: roles[0] ?? 'athlete', coachId: actor.id },
  });
  const role = useWatch({ control: form.control, name: 'role' });
  // Only the owner chooses which coach an invited athlete is assigned to.
  const picksCoach = actor.role === 'owner' && role === 'athlete';
  const members = useTeamMembers({ enabled: picksCoach });
  const coaches = (members.data ?? []).filter((m) => m.role === 'owner' || m.role === 'coach');
  const create = useCreateInvitation({
    onSuccess: (invitation) => {
      setSentTo(invitation.email);
      form.reset({ name: '', email: '', role: form.getValues('role'), coachId: actor.id });
    },
  });

  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setSentTo(null);
        const body: CreateInvitationRequest = { name: values.name, email: values.email, role: values.role };
        if (picksCoach && coaches.length > 0 && values.coachId) body.coachId = values.coachId;
        return create.mutateAsync(body);
      }}
      aria-label="Invite someone"
      className="space-y-4"
    >
      {sentTo ? (
        <Alert tone="success" title="Invitation sent">
          A link is on its way to <span className="font-semibold text-ink">{sentTo}</span>. It stays valid for{' '}
          {LIMITS.invitationTtlDays} days.
        </Alert>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="name" label="Name" autoComplete="off" maxLength={LIMITS.name.max} required />
        <TextField
          name="email"
          label="E-mail"
          type="email"
          autoComplete="off"
          inputMode="email"
          autoCapitalize="none"
          spellCheck={false}
          maxLength={LIMITS.email.max}
          required
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <Select
          name="role"
          label="Role"
          options={roles.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
          hint={ROLE_HINTS[role]}
          required
        />
        {picksCoach && coaches.length > 0 ? (
          <Select
            name="coachId"
            label="Assigned coach"
            options={coaches.map((c) => ({
              value: c.id,
              label: c.id === actor.id ? `${c.name} (you)` : c.name,
            }))}
            hint="The coach who writes this athlete's plan."
          />
        ) : null}
      </div>
      <div className="flex flex-wrap items-center gap-3 pt-1">
        <SubmitButton pendingLabel="Sending…">Send invitation</SubmitButton>
        <p className="text-sm text-ink-faint">Sending again to the same address replaces the earlier link.</p>
      </div>
    </Form>
  );
}
