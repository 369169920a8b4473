import {
  EVENT_TYPE_LABELS,
  type FlagKind,
  inFinalWeek,
  type Phase,
  PHASE_LABELS,
  PHASES,
  type RosterRow,
  type WeightUnit,
} from '@driftmark/shared';
import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  globalFilteringFeature,
  metaHelper,
  rowSortingFeature,
  sortFn_basic,
  tableFeatures,
  useTable,
  type ColumnFiltersState,
  type FilterFn,
  type SortFn,
  type SortingState,
} from '@tanstack/react-table';
import { useId, useState, type MouseEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { ChevronDownIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { DRIFT_STATE_STYLE } from '@/lib/drift-states';
import { DISPLAY_LOCALE, formatDate, formatNumber, formatWeight, NBSP } from '@/lib/format';
import { FLAG_LABELS, formatDaysAgo, formatSigned } from '../utils/roster-figures';

const STATUS: Record<RosterRow['status'], { label: string; tone: BadgeTone }> = {
  intake_pending: { label: 'Intake pending', tone: 'not-logged' },
  active: { label: 'Active', tone: 'accent' },
  ended: { label: 'Ended', tone: 'neutral' },
};

/** Days at or under which the final-week countdown applies. */

/** Safety flags in the caution and off-plan tokens; each tone carries its own glyph (Badge). */
const FLAG_TONES: Record<FlagKind, BadgeTone> = {
  acute_drop: 'off-plan',
  rate_far_beyond: 'off-plan',
  rate_beyond: 'caution',
  symptom: 'caution',
  missed_weigh_ins: 'not-logged',
};

const RATE_STANDING_LABELS = {
  on_plan: 'In band',
  drifting: 'Outside band',
  off_plan: 'Far outside',
} as const;

/** What the cells need beyond the row: the reader's units and today, and whether to name coaches. */
interface RosterTableMeta {
  weightUnit: WeightUnit;
  today: string;
  showCoach: boolean;
}

interface RosterColumnMeta {
  /** Right-aligned figures. */
  numeric?: boolean;
  className?: string;
}

// Registered once at module scope: the table's processing (sort, filter, search) and the registries
// its columns name. Only what is registered exists on the table (TanStack Table v9 `tableFeatures`).
const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { basic: sortFn_basic },
  columnFilteringFeature,
  globalFilteringFeature,
  filteredRowModel: createFilteredRowModel(),
  tableMeta: metaHelper<RosterTableMeta>(),
  columnMeta: metaHelper<RosterColumnMeta>(),
});

/** Only when "only flagged" is on does the flags column filter anything. */
const onlyFlagged: FilterFn<typeof features, RosterRow> = (row, columnId, filterValue) =>
  filterValue !== true || row.getValue<number>(columnId) > 0;
onlyFlagged.autoRemove = (value) => value !== true;

/** The search box matches name or e-mail, case and accents ignored. */
const fold = (text: string) =>
  text
    .normalize('NFD')
    .replace(/\p{Diacritic}/gu, '')
    .toLocaleLowerCase();
const nameOrEmail: FilterFn<typeof features, RosterRow> = (row, _columnId, filterValue) => {
  const needle = fold(String(filterValue ?? '').trim());
  if (!needle) return true;
  return fold(row.original.name).includes(needle) || fold(row.original.email).includes(needle);
};

/** Names in the reader's alphabet: accents and case do not split "Ángel" from "Alba". */
const collator = new Intl.Collator(DISPLAY_LOCALE, { sensitivity: 'base', numeric: true });
const byName: SortFn<typeof features, RosterRow> = (a, b, columnId) =>
  collator.compare(a.getValue<string>(columnId), b.getValue<string>(columnId));

const hasEvent = (row: RosterRow) => row.eventType !== null && row.eventType !== 'none';

// Accessors give `undefined` for a missing figure so `sortUndefined: 'last'` keeps blanks at the end
// in both directions (the sorted row model tests for undefined only, not null).
const col = createColumnHelper<typeof features, RosterRow>();
const columns = col.columns([
  col.accessor('name', {
    id: 'athlete',
    header: 'Athlete',
    sortFn: byName,
    cell: ({ row, table }) => <AthleteCell row={row.original} showCoach={table.options.meta?.showCoach} />,
  }),
  col.accessor((row) => PHASES.indexOf(row.figures.phase), {
    id: 'phase',
    header: 'Phase',
    sortFn: 'basic',
    sortDescFirst: false,
    filterFn: (row, _id, value) => !value || row.original.figures.phase === value,
    cell: ({ row }) => <PhaseCell row={row.original} />,
  }),
  col.accessor((row) => (hasEvent(row) ? (row.daysToEvent ?? undefined) : undefined), {
    id: 'daysToEvent',
    header: 'Days to event',
    sortFn: 'basic',
    sortDescFirst: false,
    sortUndefined: 'last',
    meta: { numeric: true },
    cell: ({ row }) => <EventCell row={row.original} />,
  }),
  col.accessor((row) => row.figures.latestWeightKg ?? undefined, {
    id: 'latestWeight',
    header: 'Latest weight',
    sortFn: 'basic',
    sortDescFirst: false,
    sortUndefined: 'last',
    meta: { numeric: true },
    cell: ({ row, table }) => <WeightCell row={row.original} unit={table.options.meta?.weightUnit ?? 'kg'} />,
  }),
  col.accessor((row) => row.figures.ratePercentPerWeek ?? undefined, {
    id: 'rate',
    header: () => <HeaderWithPeriod label="Rate" period="14 days" />,
    sortFn: 'basic',
    sortDescFirst: false,
    sortUndefined: 'last',
    meta: { numeric: true },
    cell: ({ row }) => <RateCell row={row.original} />,
  }),
  col.accessor((row) => row.figures.adherence7 ?? undefined, {
    id: 'adherence',
    header: () => <HeaderWithPeriod label="Adherence" period="7 days" />,
    sortFn: 'basic',
    sortDescFirst: false,
    sortUndefined: 'last',
    meta: { numeric: true },
    cell: ({ getValue }) => {
      const value = getValue();
      return value === undefined ? (
        <Missing label="nothing to judge yet" />
      ) : (
        <span className="font-semibold text-ink">{`${formatNumber(value * 100)}${NBSP}%`}</span>
      );
    },
  }),
  col.accessor((row) => row.figures.lastCheckInDate ?? undefined, {
    id: 'lastCheckIn',
    header: 'Last check-in',
    sortFn: 'basic',
    sortDescFirst: false,
    sortUndefined: 'last',
    cell: ({ getValue, table }) => {
      const date = getValue();
      if (date === undefined) return <Missing label="nothing logged yet" />;
      return (
        <time dateTime={date} title={formatDate(date)} className="text-ink">
          {formatDaysAgo(date, table.options.meta?.today ?? date)}
        </time>
      );
    },
  }),
  col.accessor((row) => row.figures.flags.length, {
    id: 'flags',
    header: 'Flags',
    sortFn: 'basic',
    sortDescFirst: true,
    filterFn: onlyFlagged,
    cell: ({ row }) => <FlagsCell flags={row.original.figures.flags} />,
  }),
]);

interface RosterTableProps {
  rows: RosterRow[];
  showCoach: boolean;
  /** The reader's weight unit (GET /api/me). */
  weightUnit: WeightUnit;
  /** The reader's today (YYYY-MM-DD), for "3 days ago". */
  today: string;
}

/**
 * The roster: one row per athlete with the figures a coach scans (phase, event, weight and trend,
 * rate against the band, adherence, last check-in, flags). Every column sorts; a search box, a phase
 * choice and "only flagged" narrow the rows. Rows keep the server's order (nearest event) until a
 * header is pressed.
 */
export function RosterTable({ rows, showCoach, weightUnit, today }: RosterTableProps) {
  const navigate = useNavigate();
  const ids = useId();
  const [sorting, setSorting] = useState<SortingState>([]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [search, setSearch] = useState('');

  const table = useTable({
    features,
    columns,
    data: rows,
    getRowId: (row) => row.athleteId,
    state: { sorting, columnFilters, globalFilter: search },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onGlobalFilterChange: setSearch,
    enableMultiSort: false,
    globalFilterFn: nameOrEmail,
    getColumnCanGlobalFilter: (column) => column.id === 'athlete',
    meta: { weightUnit, today, showCoach },
  });

  const phaseFilter = (table.getColumn('phase')?.getFilterValue() as Phase | undefined) ?? '';
  const flaggedOnly = table.getColumn('flags')?.getFilterValue() === true;
  const shown = table.getRowModel().rows;
  const filtering = search.trim() !== '' || phaseFilter !== '' || flaggedOnly;

  function clearFilters() {
    setSearch('');
    setColumnFilters([]);
  }

  function openRow(event: MouseEvent<HTMLTableRowElement>, athleteId: string) {
    // Links, buttons and text being selected keep their own behaviour.
    if ((event.target as HTMLElement).closest('a, button, input, select, label')) return;
    if (window.getSelection()?.toString()) return;
    const href = paths.coachAthlete(athleteId);
    if (event.metaKey || event.ctrlKey) window.open(href, '_blank', 'noopener');
    else void navigate(href);
  }

  return (
    <div>
      <div
        role="search"
        aria-label="Filter the roster"
        className="mb-4 flex flex-wrap items-end gap-x-4 gap-y-3 rounded-lg border border-line bg-surface px-4 py-3"
      >
        <div className="w-full sm:w-72">
          <label htmlFor={`${ids}-search`} className="mb-1.5 block text-sm font-semibold text-ink">
            Search
          </label>
          <input
            id={`${ids}-search`}
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="Name or e-mail"
            autoComplete="off"
            className={cn(controlClasses, 'min-h-10 border-line-strong py-1.5')}
          />
        </div>
        <div className="w-full sm:w-52">
          <label htmlFor={`${ids}-phase`} className="mb-1.5 block text-sm font-semibold text-ink">
            Phase
          </label>
          <div className="relative">
            <select
              id={`${ids}-phase`}
              value={phaseFilter}
              onChange={(e) => table.getColumn('phase')?.setFilterValue(e.target.value || undefined)}
              className={cn(controlClasses, 'min-h-10 appearance-none border-line-strong py-1.5 pr-10')}
            >
              <option value="">All phases</option>
              {PHASES.map((phase) => (
                <option key={phase} value={phase}>
                  {PHASE_LABELS[phase]}
                </option>
              ))}
            </select>
            <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-lg text-ink-muted" />
          </div>
        </div>
        <label className="flex min-h-10 cursor-pointer items-center gap-2.5 text-sm font-semibold text-ink">
          <input
            type="checkbox"
            checked={flaggedOnly}
            onChange={(e) => table.getColumn('flags')?.setFilterValue(e.target.checked || undefined)}
            className="size-5 accent-accent"
          />
          Only flagged
        </label>
        <p aria-live="polite" className="ml-auto min-h-10 content-center text-sm text-ink-muted tabular-nums">
          {filtering
            ? `${formatNumber(shown.length)} of ${formatNumber(rows.length)} athletes`
            : `${formatNumber(rows.length)} ${rows.length === 1 ? 'athlete' : 'athletes'}`}
        </p>
      </div>

      <div className="overflow-x-auto rounded-lg border border-line bg-surface shadow-card">
        <table className="w-full min-w-[56rem] border-collapse text-left text-sm">
          <caption className="sr-only">
            Athletes you coach. Press a column heading to sort by it; open an athlete by their name. Days to
            event count from today in each athlete&apos;s time zone; weights in {weightUnit}.
          </caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-line bg-sunken/60">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const numeric = header.column.columnDef.meta?.numeric;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined
                      }
                      className={cn(
                        'px-0.5 py-1.5 align-bottom first:pl-2.5 last:pr-2.5',
                        numeric ? 'text-right' : undefined,
                      )}
                    >
                      {header.isPlaceholder ? null : (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className={cn(
                            'inline-flex min-h-9 items-center gap-1 rounded-md px-1.5 py-1 text-xs font-semibold tracking-wide uppercase',
                            'hover:bg-surface hover:text-ink',
                            sorted ? 'text-ink' : 'text-ink-muted',
                            numeric ? 'flex-row-reverse text-right' : 'text-left',
                          )}
                        >
                          <table.FlexRender header={header} />
                          <SortGlyph direction={sorted} />
                        </button>
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-line">
            {shown.map((row) => (
              <tr
                key={row.id}
                onClick={(e) => openRow(e, row.original.athleteId)}
                className="cursor-pointer align-top hover:bg-paper/70"
              >
                {row.getAllCells().map((cell) => {
                  const numeric = cell.column.columnDef.meta?.numeric;
                  const Cell = cell.column.id === 'athlete' ? 'th' : 'td';
                  return (
                    <Cell
                      key={cell.id}
                      scope={Cell === 'th' ? 'row' : undefined}
                      className={cn(
                        'px-2 py-3 font-normal tabular-nums first:pl-4 last:pr-4',
                        numeric ? 'text-right' : undefined,
                        cell.column.columnDef.meta?.className,
                      )}
                    >
                      <table.FlexRender cell={cell} />
                    </Cell>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
        {shown.length === 0 ? (
          <div className="flex flex-col items-center gap-3 px-6 py-8 text-center">
            <p className="font-semibold text-ink">No athletes match these filters.</p>
            <Button variant="secondary" size="sm" onClick={clearFilters}>
              Clear search and filters
            </Button>
          </div>
        ) : null}
      </div>
    </div>
  );
}

function AthleteCell({ row, showCoach }: { row: RosterRow; showCoach?: boolean }) {
  const status = STATUS[row.status];
  return (
    <>
      <Link to={paths.coachAthlete(row.athleteId)} className="block font-semibold whitespace-nowrap">
        {row.name}
      </Link>
      <EmailText email={row.email} />
      {showCoach ? <span className="block text-xs text-ink-muted">Coach: {row.coach.name}</span> : null}
      {row.status !== 'active' ? (
        <Badge tone={status.tone} className="mt-1">
          {status.label}
        </Badge>
      ) : null}
    </>
  );
}

/** An address may break before its "@" (never inside a word), so long ones wrap in two tidy parts. */
function EmailText({ email }: { email: string }) {
  const at = email.indexOf('@');
  return (
    <span className="block text-xs text-ink-faint">
      {at > 0 ? (
        <>
          {email.slice(0, at)}
          <wbr />
          {email.slice(at)}
        </>
      ) : (
        email
      )}
    </span>
  );
}

function PhaseCell({ row }: { row: RosterRow }) {
  const { phase, countdownLabel } = row.figures;
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <span className={phase === 'no_plan' ? 'text-ink-muted' : 'font-medium text-ink'}>
        {PHASE_LABELS[phase]}
      </span>
      {countdownLabel ? <Badge tone="caution">Day {countdownLabel}</Badge> : null}
    </span>
  );
}

function EventCell({ row }: { row: RosterRow }) {
  if (!hasEvent(row) || !row.eventType) {
    return row.eventType === 'none' ? (
      <span className="text-ink-muted">No event</span>
    ) : (
      <Missing label="no event given" />
    );
  }
  const days = row.daysToEvent;
  const finalWeek = inFinalWeek(days);
  const label =
    days === null
      ? '—'
      : days === 0
        ? 'Event day'
        : days < 0
          ? `${formatNumber(-days)} ago`
          : formatNumber(days);
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <span className={cn('text-base', finalWeek ? 'font-bold text-ink' : 'text-ink')}>{label}</span>
      {finalWeek ? <Badge tone="caution">Final week</Badge> : null}
      <span className="block max-w-48 text-xs text-ink-faint">
        <span className="font-medium text-ink-muted">
          {row.eventName || EVENT_TYPE_LABELS[row.eventType]}
        </span>
        {row.eventDate ? ` · ${formatDate(row.eventDate, 'short')}` : null}
        {row.division ? ` · ${row.division}` : null}
      </span>
    </span>
  );
}

function WeightCell({ row, unit }: { row: RosterRow; unit: WeightUnit }) {
  const { latestWeightKg, latestWeighInDate, trendKg, weighInGap: gap } = row.figures;
  if (latestWeightKg === null) return <Missing label="no weigh-in yet" />;
  return (
    <span className="inline-flex flex-col items-end">
      <span className="font-semibold whitespace-nowrap text-ink">
        {formatWeight(latestWeightKg, unit)}
        {latestWeighInDate ? (
          <span className="sr-only">, weighed {formatDate(latestWeighInDate)}</span>
        ) : null}
      </span>
      {trendKg !== null ? (
        <span className="text-xs whitespace-nowrap text-ink-faint">trend {formatWeight(trendKg, unit)}</span>
      ) : null}
      {gap?.over ? (
        <span className="mt-1 inline-flex flex-col items-end gap-0.5">
          <Badge tone="caution">Over the limit</Badge>
          <span className="text-xs whitespace-nowrap text-ink-muted tabular-nums">
            +{formatWeight(gap.overKg, unit)} · {formatNumber(gap.overPct, 1, 1)}
            {NBSP}% · {gap.daysLeft} days left
          </span>
        </span>
      ) : null}
    </span>
  );
}

function RateCell({ row }: { row: RosterRow }) {
  const { ratePercentPerWeek: rate, rateBand: band, rateBandNote, rateVerdict } = row.figures;
  if (rate === null) return <Missing label="too few weigh-ins" />;
  // The server's verdict on the rate against its band.
  const standing = rateVerdict?.state ?? null;
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <span className="font-semibold whitespace-nowrap text-ink">{`${formatSigned(rate)}${NBSP}%/wk`}</span>
      {standing && band ? (
        <>
          <Badge tone={DRIFT_STATE_STYLE[standing].tone}>{RATE_STANDING_LABELS[standing]}</Badge>
          <span className="text-xs text-ink-faint">
            band {formatBandEnd(Math.min(band.minPct, band.maxPct))} to{' '}
            {formatBandEnd(Math.max(band.minPct, band.maxPct))}
          </span>
        </>
      ) : (
        <span className="max-w-40 text-right text-xs text-ink-faint">
          {rateBandNote ?? 'no band for this phase'}
        </span>
      )}
    </span>
  );
}

/** Band ends keep their second decimal when they have one (±0.25 must not read as ±0.3). */
function formatBandEnd(value: number): string {
  return formatSigned(value, Number.isInteger(Math.round(value * 1000) / 100) ? 1 : 2);
}

function FlagsCell({ flags }: { flags: FlagKind[] }) {
  if (flags.length === 0) return <Missing label="no flags" />;
  return (
    <ul className="flex max-w-32 flex-wrap gap-1" aria-label="Flags">
      {flags.map((flag) => (
        <li key={flag}>
          <Badge tone={FLAG_TONES[flag]} className="rounded-md! whitespace-normal!">
            {FLAG_LABELS[flag]}
          </Badge>
        </li>
      ))}
    </ul>
  );
}

/** A heading with its time window beneath it in small type: "Rate / 14 days". */
function HeaderWithPeriod({ label, period }: { label: string; period: string }) {
  return (
    <span className="flex flex-col">
      {label}
      <span className="font-medium tracking-normal normal-case">{period}</span>
    </span>
  );
}

function SortGlyph({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <svg viewBox="0 0 10 14" className="size-3 shrink-0" aria-hidden="true">
      <path d="M5 1 8.5 5.5h-7z" fill="currentColor" opacity={direction === 'asc' ? 1 : 0.3} />
      <path d="M5 13 1.5 8.5h7z" fill="currentColor" opacity={direction === 'desc' ? 1 : 0.3} />
    </svg>
  );
}

function Missing({ label = 'not given' }: { label?: string }) {
  return (
    <span className="text-ink-faint">
      <span aria-hidden="true">—</span>
      <span className="sr-only">{label}</span>
    </span>
  );
}

/** Counts a coach reads at a glance above the table. */
export function RosterSummary({ rows }: { rows: RosterRow[] }) {
  const finalWeek = rows.filter((r) => r.eventType !== 'none' && inFinalWeek(r.daysToEvent)).length;
  // The server's one rule for "has a safety flag" (the review queue counts with the same rule).
  const flagged = rows.filter((r) => r.figures.safetyFlag).length;
  const pending = rows.filter((r) => r.status === 'intake_pending').length;
  const items = [
    { label: rows.length === 1 ? 'athlete' : 'athletes', value: rows.length },
    { label: 'in the final week', value: finalWeek },
    { label: 'with a safety flag', value: flagged },
    { label: 'intake pending', value: pending },
  ];
  return (
    <dl className="mb-5 grid grid-cols-2 gap-3 sm:max-w-3xl sm:grid-cols-4">
      {items.map((item) => (
        <div key={item.label} className="flex flex-col rounded-md border border-line bg-surface px-3 py-3">
          <dt className="text-xs text-ink-muted">{item.label}</dt>
          <dd className="order-first text-2xl font-bold text-ink tabular-nums">{formatNumber(item.value)}</dd>
        </div>
      ))}
    </dl>
  );
}
