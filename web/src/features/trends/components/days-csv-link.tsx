import { buttonClasses, type ButtonSize } from '@/components/ui/button';
import { DownloadIcon } from '@/components/ui/icons';

/** The CSV of the days from..to (GET /api/athletes/:id/days.csv), in the viewer's own units. */
export function daysCsvUrl(athleteId: string, from: string, to: string): string {
  const query = new URLSearchParams({ from, to });
  return `/api/athletes/${encodeURIComponent(athleteId)}/days.csv?${query.toString()}`;
}

/**
 * A download link styled as a button: the browser fetches the file with the session cookie and
 * saves it (the server answers with Content-Disposition: attachment).
 */
export function DaysCsvLink({
  athleteId,
  from,
  to,
  size = 'sm',
  className,
}: {
  athleteId: string;
  from: string;
  to: string;
  size?: ButtonSize;
  className?: string;
}) {
  return (
    <a
      href={daysCsvUrl(athleteId, from, to)}
      download
      className={buttonClasses('secondary', size, className)}
      aria-label={`Download the days ${from} to ${to} as CSV`}
    >
      <DownloadIcon />
      Download CSV
    </a>
  );
}
