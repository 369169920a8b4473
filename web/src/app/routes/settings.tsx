import { isStaffRole, ROLE_LABELS, type Me } from '@driftmark/shared';
import { useQueryClient } from '@tanstack/react-query';
import { ButtonLink } from '@/components/ui/button';
import { Card, CardHeader } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { authKeys } from '@/features/auth/api/keys';
import { cutKeys } from '@/features/cuts/api/keys';
import { planKeys } from '@/features/plans/api/keys';
import { MyDataCard } from '@/features/data-rights/components/my-data-card';
import { AcuteShareForm } from '@/features/settings/components/acute-share-form';
import { ChangePasswordForm } from '@/features/settings/components/change-password-form';
import { GuardrailFloorsForm } from '@/features/settings/components/guardrail-floors-form';
import { NotificationPreferencesForm } from '@/features/settings/components/notification-preferences-form';
import { SettingsForm } from '@/features/settings/components/settings-form';
import { SignedInDevices } from '@/features/settings/components/signed-in-devices';
import { CheckInQuestionsEditor } from '@/features/weekly/components/check-in-questions-editor';
import { SignOutButton } from '../layouts/sign-out-button';
import { useCurrentUser } from '../session';

export function SettingsRoute() {
  const me = useCurrentUser();
  const queryClient = useQueryClient();
  const setMe = (next: Me) => queryClient.setQueryData(authKeys.me, next);
  const staff = isStaffRole(me.role);

  return (
    <div className={staff ? 'max-w-2xl' : undefined}>
      <title>Settings · Driftmark</title>
      <PageHeader title="Settings" description="How Driftmark shows your numbers and days." />
      <div className="space-y-5">
        <Card aria-labelledby="profile-heading">
          <CardHeader id="profile-heading" title="Profile and units" />
          <SettingsForm me={me} onSaved={setMe} />
        </Card>
        {staff ? (
          <Card aria-labelledby="guardrails-heading">
            <CardHeader id="guardrails-heading" eyebrow="Team" title="Guardrail floors" />
            <p className="mb-4 text-sm text-ink-muted">
              Every plan save and every countdown is checked against these floors for the athlete&apos;s sex.
            </p>
            <GuardrailFloorsForm
              canEdit={me.abilities.manageTeam}
              // Plan pages carry the floors for their live checks.
              onSaved={() => void queryClient.invalidateQueries({ queryKey: planKeys.all })}
            />
          </Card>
        ) : null}
        {staff ? (
          <Card aria-labelledby="cut-settings-heading">
            <CardHeader id="cut-settings-heading" eyebrow="Team" title="Making weight: acute share" />
            <p className="mb-4 text-sm text-ink-muted">
              Every new cut plan is checked against this share of body mass for its last days before the
              weigh-in.
            </p>
            <AcuteShareForm
              canEdit={me.abilities.manageTeam}
              // The making-weight panels show the threshold in force.
              onSaved={() => void queryClient.invalidateQueries({ queryKey: cutKeys.all })}
            />
          </Card>
        ) : null}
        {staff ? (
          <Card aria-labelledby="check-in-questions-heading">
            <CardHeader id="check-in-questions-heading" eyebrow="Team" title="Weekly check-in questions" />
            <p className="mb-4 text-sm text-ink-muted">
              Every athlete answers these with their weekly check-in, beside the week&apos;s figures.
            </p>
            <CheckInQuestionsEditor canEdit={me.role === 'owner' || me.role === 'coach'} />
          </Card>
        ) : null}
        {!staff ? (
          <Card padding="compact" aria-labelledby="details-heading">
            <h2 id="details-heading" className="font-semibold text-ink">
              Your details and event
            </h2>
            <p className="mt-1 text-sm text-ink-muted">Height, usual intake, your event and consents.</p>
            <ButtonLink to={paths.intake} variant="secondary" className="mt-3">
              Review or change them
            </ButtonLink>
          </Card>
        ) : null}
        {!staff ? (
          <Card id="my-data" aria-labelledby="my-data-heading">
            <CardHeader id="my-data-heading" title="Your data" />
            <MyDataCard />
          </Card>
        ) : null}
        <Card id="e-mail" aria-labelledby="e-mail-heading">
          <CardHeader id="e-mail-heading" title="E-mail" />
          <NotificationPreferencesForm staff={staff} timeZone={me.timeZone} />
        </Card>
        <Card aria-labelledby="password-heading">
          <CardHeader id="password-heading" title="Your password" />
          <ChangePasswordForm onChanged={setMe} />
        </Card>
        <Card id="devices" aria-labelledby="devices-heading">
          <CardHeader id="devices-heading" title="Signed-in devices" />
          <SignedInDevices
            clock={{ whose: 'viewer', timeZone: me.timeZone }}
            signOutHere={<SignOutButton size="sm" />}
          />
        </Card>
        <Card aria-labelledby="account-heading">
          <CardHeader id="account-heading" title="Account" />
          <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2 text-sm">
            <dt className="text-ink-faint">E-mail</dt>
            <dd className="break-all text-ink">{me.email}</dd>
            <dt className="text-ink-faint">Role</dt>
            <dd className="text-ink">{ROLE_LABELS[me.role]}</dd>
            <dt className="text-ink-faint">Team</dt>
            <dd className="text-ink">{me.team.name}</dd>
          </dl>
          <SignOutButton className="mt-4 -ml-4 items-start" />
        </Card>
      </div>
    </div>
  );
}
