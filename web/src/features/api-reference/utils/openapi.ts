/**
 * Reading the OpenAPI 3.1 description for the reference page: the operations grouped by their tag,
 * and a schema laid out as rows (name, type, required, description) to a bounded depth. Only what
 * the server's description uses (zod-openapi output): $ref to components, type, enum, const,
 * format, items, properties, anyOf/oneOf, nullable types.
 */

export interface JsonSchema {
  $ref?: string;
  type?: string | string[];
  enum?: unknown[];
  const?: unknown;
  format?: string;
  description?: string;
  items?: JsonSchema;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  additionalProperties?: boolean | JsonSchema;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
}

interface Media {
  schema?: JsonSchema;
}

export interface OpenApiOperation {
  operationId?: string;
  summary?: string;
  tags?: string[];
  security?: unknown[];
  parameters?: { name: string; in: string; required?: boolean; schema?: JsonSchema; description?: string }[];
  requestBody?: { content: Record<string, Media> };
  responses: Record<string, { description?: string; content?: Record<string, Media> }>;
}

export interface OpenApiDescription {
  openapi: string;
  info: { title: string; version: string; description?: string };
  paths: Record<string, Record<string, OpenApiOperation>>;
  components?: { schemas?: Record<string, JsonSchema> };
}

export interface OperationEntry {
  method: string;
  path: string;
  operation: OpenApiOperation;
}

const METHOD_ORDER = ['get', 'post', 'put', 'patch', 'delete'];

/** Operations by tag (tags in alphabetical order; within one, by path then method). */
export function operationsByTag(doc: OpenApiDescription): [string, OperationEntry[]][] {
  const groups = new Map<string, OperationEntry[]>();
  for (const [path, item] of Object.entries(doc.paths)) {
    for (const [method, operation] of Object.entries(item)) {
      if (!METHOD_ORDER.includes(method)) continue;
      const tag = operation.tags?.[0] ?? 'other';
      const list = groups.get(tag) ?? [];
      list.push({ method, path, operation });
      groups.set(tag, list);
    }
  }
  for (const list of groups.values()) {
    list.sort(
      (a, b) =>
        a.path.localeCompare(b.path) || METHOD_ORDER.indexOf(a.method) - METHOD_ORDER.indexOf(b.method),
    );
  }
  return [...groups.entries()].sort(([a], [b]) => a.localeCompare(b));
}

/** Whether an operation matches a search (path, method or summary, any case). */
export function matches(entry: OperationEntry, search: string): boolean {
  const q = search.trim().toLowerCase();
  if (!q) return true;
  return `${entry.method} ${entry.path} ${entry.operation.summary ?? ''}`.toLowerCase().includes(q);
}

const refName = (ref: string): string => ref.split('/').pop() ?? ref;

function resolve(doc: OpenApiDescription, schema: JsonSchema): JsonSchema {
  return schema.$ref ? (doc.components?.schemas?.[refName(schema.$ref)] ?? {}) : schema;
}

/** A short type label: `string (uuid)`, `"kg" | "lb"`, `DayView[]`, `number | null`. */
export function typeLabel(doc: OpenApiDescription, schema: JsonSchema): string {
  if (schema.$ref) return refName(schema.$ref);
  if (schema.const !== undefined) return JSON.stringify(schema.const);
  if (schema.enum) return schema.enum.map((v) => JSON.stringify(v)).join(' | ');
  const union = schema.anyOf ?? schema.oneOf;
  if (union) return union.map((s) => typeLabel(doc, s)).join(' | ');
  if (schema.allOf?.length === 1) return typeLabel(doc, schema.allOf[0]!);
  const types = Array.isArray(schema.type) ? schema.type : schema.type ? [schema.type] : [];
  const label = types
    .map((t) => {
      if (t === 'array') {
        const item = schema.items ? typeLabel(doc, schema.items) : 'any';
        return item.includes(' | ') ? `(${item})[]` : `${item}[]`;
      }
      if (t === 'object' && !schema.properties && typeof schema.additionalProperties === 'object')
        return `map of ${typeLabel(doc, schema.additionalProperties)}`;
      return schema.format && t !== 'null' ? `${t} (${schema.format})` : t;
    })
    .join(' | ');
  return label || 'any';
}

export interface SchemaRow {
  /** Dotted path from the top (`data.fluids[].volume`). */
  name: string;
  depth: number;
  type: string;
  required: boolean;
  description?: string;
}

/** The object (or array of objects, or one branch of a nullable) whose fields a row opens into. */
function fieldsOf(doc: OpenApiDescription, schema: JsonSchema): JsonSchema | null {
  const s = resolve(doc, schema);
  if (s.properties) return s;
  if (s.items) return fieldsOf(doc, s.items);
  const union = s.anyOf ?? s.oneOf;
  if (union) {
    const objects = union.map((u) => fieldsOf(doc, u)).filter((u): u is JsonSchema => u !== null);
    if (objects.length === 1) return objects[0]!;
  }
  return null;
}

/**
 * The fields of a schema as rows, opening nested objects down to `maxDepth` levels. A component
 * already being opened on the way down is not opened again (a cycle).
 */
export function schemaRows(doc: OpenApiDescription, schema: JsonSchema, maxDepth = 3): SchemaRow[] {
  const rows: SchemaRow[] = [];
  const walk = (s: JsonSchema, prefix: string, depth: number, open: ReadonlySet<string>) => {
    const obj = fieldsOf(doc, s);
    if (!obj?.properties || depth >= maxDepth) return;
    const required = new Set(obj.required ?? []);
    for (const [name, child] of Object.entries(obj.properties)) {
      const path = prefix ? `${prefix}.${name}` : name;
      const isArray = resolve(doc, child).type === 'array';
      rows.push({
        name: path,
        depth,
        type: typeLabel(doc, child),
        required: required.has(name),
        description: child.description ?? resolve(doc, child).description,
      });
      const ref = child.$ref ?? (isArray ? resolve(doc, child).items?.$ref : undefined);
      if (ref && open.has(ref)) continue;
      walk(child, isArray ? `${path}[]` : path, depth + 1, ref ? new Set([...open, ref]) : open);
    }
  };
  walk(schema, '', 0, new Set(schema.$ref ? [schema.$ref] : []));
  return rows;
}
