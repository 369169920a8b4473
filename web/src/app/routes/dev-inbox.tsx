import { useSearchParams } from 'react-router';
import { BrandMark, SkipLink } from '@/components/ui/app-shell';
import { InfoIcon } from '@/components/ui/icons';
import { MailList } from '@/features/dev-inbox/components/mail-list';
import { MailView } from '@/features/dev-inbox/components/mail-view';

/** The demo inbox: e-mails the app "sent", read here instead of leaving the machine. */
export function DevInboxRoute() {
  const [params, setParams] = useSearchParams();
  const selected = params.get('id');

  return (
    <div className="min-h-dvh">
      <SkipLink />
      <title>Demo inbox · Driftmark</title>
      <div role="note" className="border-b border-drifting/30 bg-drifting-soft px-5 py-2.5 text-sm text-ink">
        <p className="mx-auto flex max-w-6xl items-center gap-2">
          <InfoIcon className="shrink-0 text-drifting" />
          <span>
            <span className="font-semibold">Demo mode:</span> e-mails are captured here, none leave this
            machine
          </span>
        </p>
      </div>
      <header className="mx-auto flex max-w-6xl items-center justify-between px-5 pt-6">
        <BrandMark />
      </header>
      <main id="main" tabIndex={-1} className="mx-auto max-w-6xl px-5 py-6 outline-none">
        <h1 className="mb-1 text-2xl font-bold text-ink">Demo inbox</h1>
        <p className="mb-6 text-ink-muted">
          Invitations and password resets land here. Newest first; the list refreshes itself.
        </p>
        <div className="grid gap-6 md:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
          <MailList
            selectedId={selected}
            onSelect={(id) => {
              setParams((p) => {
                p.set('id', id);
                return p;
              });
              // On a phone the message opens below the list: bring it into view.
              if (window.matchMedia('(max-width: 767px)').matches) {
                requestAnimationFrame(() =>
                  document.getElementById('mail-view')?.scrollIntoView({ block: 'start' }),
                );
              }
            }}
          />
          <div id="mail-view" className="scroll-mt-4">
            <MailView id={selected} />
          </div>
        </div>
      </main>
    </div>
  );
}
