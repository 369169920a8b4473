import { EVENT_TYPE_LABELS, type TemplateView } from '@driftmark/shared';
import { Link } from 'react-router';
import { formatInstantDate, formatNumber } from '@/lib/format';
import { offsetRange } from '../utils/template-form';

/** The team's countdown templates, by name: event type, the days they cover, when and by whom. */
export function TemplateList({
  templates,
  hrefFor,
}: {
  templates: readonly TemplateView[];
  /** The editor (or read-only view) of one template. */
  hrefFor: (templateId: string) => string;
}) {
  const rows = [...templates].sort((a, b) => a.name.localeCompare(b.name));
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface shadow-card">
      <table className="w-full min-w-[760px] border-collapse text-left text-sm">
        <caption className="sr-only">Countdown templates of the team, by name.</caption>
        <thead>
          <tr className="border-b border-line bg-sunken/60 text-xs font-semibold tracking-wide text-ink-muted uppercase">
            <th scope="col" className="px-3 py-3">
              Template
            </th>
            <th scope="col" className="px-3 py-3">
              Event
            </th>
            <th scope="col" className="px-3 py-3">
              Days
            </th>
            <th scope="col" className="px-3 py-3">
              Updated
            </th>
            <th scope="col" className="px-3 py-3">
              Made by
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((t) => (
            <tr key={t.id} className="align-top hover:bg-paper/70">
              <th scope="row" className="max-w-md px-3 py-3 font-normal">
                <Link to={hrefFor(t.id)} className="block font-semibold">
                  {t.name}
                </Link>
                {t.description ? (
                  <span className="mt-0.5 line-clamp-2 block text-xs text-ink-muted">{t.description}</span>
                ) : null}
              </th>
              <td className="px-3 py-3 whitespace-nowrap text-ink">{EVENT_TYPE_LABELS[t.eventType]}</td>
              <td className="px-3 py-3 whitespace-nowrap tabular-nums">
                <span className="block font-medium text-ink">{offsetRange(t.days)}</span>
                <span className="block text-xs text-ink-faint">
                  {formatNumber(t.days.length)} {t.days.length === 1 ? 'day' : 'days'}
                </span>
              </td>
              <td className="px-3 py-3 whitespace-nowrap text-ink tabular-nums">
                {formatInstantDate(t.updatedAt)}
              </td>
              <td className="px-3 py-3 whitespace-nowrap text-ink-muted">{t.createdBy.name}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
