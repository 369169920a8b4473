import { useId, useState } from 'react';
import { Badge } from '@/components/ui/badge';
import { controlClasses } from '@/components/ui/field';
import { cn } from '@/lib/cn';
import {
  matches,
  operationsByTag,
  schemaRows,
  typeLabel,
  type JsonSchema,
  type OpenApiDescription,
  type OperationEntry,
} from '../utils/openapi';

const METHOD_STYLES: Record<string, string> = {
  get: 'bg-accent-soft text-accent-strong',
  post: 'bg-on-plan-soft text-on-plan',
  put: 'bg-drifting-soft text-drifting',
  patch: 'bg-drifting-soft text-drifting',
  delete: 'bg-off-plan-soft text-off-plan',
};

function MethodTag({ method }: { method: string }) {
  return (
    <span
      className={cn(
        'inline-flex w-16 shrink-0 justify-center rounded px-1.5 py-0.5 font-mono text-xs font-bold uppercase',
        METHOD_STYLES[method] ?? 'bg-sunken text-ink-muted',
      )}
    >
      {method}
    </span>
  );
}

function SchemaTable({
  doc,
  schema,
  caption,
}: {
  doc: OpenApiDescription;
  schema: JsonSchema;
  caption: string;
}) {
  const rows = schemaRows(doc, schema);
  if (rows.length === 0) {
    return (
      <p className="text-sm text-ink-muted">
        {caption}: <code className="font-mono">{typeLabel(doc, schema)}</code>
      </p>
    );
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="mb-1 text-left text-xs font-semibold tracking-wide text-ink-muted uppercase">
          {caption}
        </caption>
        <thead className="sr-only">
          <tr>
            <th scope="col">Field</th>
            <th scope="col">Type</th>
            <th scope="col">About</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((row) => (
            <tr key={row.name} className="align-top">
              <td
                className="py-1 pr-3 font-mono text-xs whitespace-nowrap"
                style={{ paddingLeft: `${row.depth}rem` }}
              >
                {row.name.split('.').pop()}
                {row.required ? null : <span className="text-ink-faint">?</span>}
              </td>
              <td className="py-1 pr-3 font-mono text-xs break-all text-accent-strong">{row.type}</td>
              <td className="py-1 text-xs text-ink-muted">{row.description}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function OperationItem({ doc, entry }: { doc: OpenApiDescription; entry: OperationEntry }) {
  const { operation } = entry;
  const parameters = operation.parameters ?? [];
  const body = operation.requestBody ? Object.entries(operation.requestBody.content)[0] : undefined;
  const answers = Object.entries(operation.responses).filter(([status]) => status !== 'default');
  return (
    <li>
      <details className="group">
        <summary className="flex min-h-touch cursor-pointer list-none flex-wrap items-center gap-x-3 gap-y-1 px-4 py-2 hover:bg-sunken/60">
          <MethodTag method={entry.method} />
          <code className="font-mono text-sm break-all text-ink">{entry.path}</code>
          <span className="text-sm text-ink-muted">{operation.summary}</span>
          {operation.security?.length === 0 ? <Badge tone="neutral">no session</Badge> : null}
        </summary>
        <div className="space-y-4 border-t border-line bg-canvas px-4 py-3">
          {parameters.length > 0 ? (
            <div className="overflow-x-auto">
              <table className="w-full text-left text-sm">
                <caption className="mb-1 text-left text-xs font-semibold tracking-wide text-ink-muted uppercase">
                  Parameters
                </caption>
                <tbody className="divide-y divide-line">
                  {parameters.map((p) => (
                    <tr key={`${p.in}:${p.name}`} className="align-top">
                      <td className="py-1 pr-3 font-mono text-xs">
                        {p.name}
                        {p.required ? null : <span className="text-ink-faint">?</span>}
                      </td>
                      <td className="py-1 pr-3 text-xs text-ink-muted">{p.in}</td>
                      <td className="py-1 font-mono text-xs break-all text-accent-strong">
                        {p.schema ? typeLabel(doc, p.schema) : 'string'}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          {body?.[1].schema ? (
            <SchemaTable doc={doc} schema={body[1].schema} caption={`Request body (${body[0]})`} />
          ) : null}
          {answers.map(([status, answer]) => {
            const [media, content] = Object.entries(answer.content ?? {})[0] ?? [];
            return (
              <div key={status} className="space-y-1">
                <p className="text-sm">
                  <span className="font-mono font-semibold tabular-nums">{status}</span>{' '}
                  <span className="text-ink-muted">{answer.description}</span>
                  {media && media !== 'application/json' ? (
                    <span className="text-ink-muted"> · {media}</span>
                  ) : null}
                </p>
                {media === 'application/json' && content?.schema ? (
                  <SchemaTable doc={doc} schema={content.schema} caption={`Answer ${status}`} />
                ) : null}
              </div>
            );
          })}
          <p className="text-xs text-ink-muted">
            Any other status carries the error body: <code className="font-mono">ErrorResponse</code>.
          </p>
        </div>
      </details>
    </li>
  );
}

/** The whole reference: a filter box, then the operations by tag, each opening to its shapes. */
export function ApiReference({ doc }: { doc: OpenApiDescription }) {
  const [search, setSearch] = useState('');
  const searchId = useId();
  const groups = operationsByTag(doc)
    .map(([tag, list]) => [tag, list.filter((entry) => matches(entry, search))] as const)
    .filter(([, list]) => list.length > 0);
  const count = groups.reduce((n, [, list]) => n + list.length, 0);
  return (
    <div className="space-y-6">
      <div className="max-w-md">
        <label htmlFor={searchId} className="mb-1 block text-sm font-semibold text-ink">
          Find a route
        </label>
        <input
          id={searchId}
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          placeholder="e.g. weigh-in, /api/athletes, POST"
          className={cn(controlClasses, 'border-line')}
        />
        <p className="mt-1 text-xs text-ink-muted tabular-nums" aria-live="polite">
          {count} {count === 1 ? 'route' : 'routes'}
        </p>
      </div>
      {groups.map(([tag, list]) => (
        <section key={tag} aria-labelledby={`${searchId}-${tag}`}>
          <h2 id={`${searchId}-${tag}`} className="mb-2 font-mono text-base font-semibold text-ink">
            /api/{tag}
          </h2>
          <ul className="divide-y divide-line overflow-hidden rounded-lg border border-line bg-surface shadow-card">
            {list.map((entry) => (
              <OperationItem key={`${entry.method} ${entry.path}`} doc={doc} entry={entry} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
