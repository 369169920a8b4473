import { describe, expect, it } from 'vitest';
import { matches, operationsByTag, schemaRows, typeLabel, type OpenApiDescription } from './openapi';

/** A small description in the shape zod-openapi writes (OpenAPI 3.1, components by $ref). */
const doc: OpenApiDescription = {
  openapi: '3.1.0',
  info: { title: 'T', version: '1' },
  components: {
    schemas: {
      Mark: {
        type: 'object',
        required: ['id', 'replies'],
        properties: {
          id: { type: 'string', format: 'uuid', description: 'Mark id.' },
          note: { anyOf: [{ type: 'string' }, { type: 'null' }] },
          replies: { type: 'array', items: { $ref: '#/components/schemas/Mark' } },
        },
      },
    },
  },
  paths: {
    '/api/marks/{markId}': {
      delete: { summary: 'Delete a mark', tags: ['marks'], responses: { '204': {} } },
      get: { summary: 'One mark', tags: ['marks'], responses: {} },
    },
    '/api/athletes/{athleteId}': { get: { summary: 'Profile', tags: ['athletes'], responses: {} } },
  },
};

describe('the API reference reading the description', () => {
  it('groups operations by tag, by path then method', () => {
    const groups = operationsByTag(doc);
    expect(groups.map(([tag, list]) => [tag, list.map((e) => `${e.method} ${e.path}`)])).toEqual([
      ['athletes', ['get /api/athletes/{athleteId}']],
      ['marks', ['get /api/marks/{markId}', 'delete /api/marks/{markId}']],
    ]);
    const [, marks] = groups[1]!;
    expect(marks.filter((e) => matches(e, 'DELETE'))).toHaveLength(1);
    expect(marks.filter((e) => matches(e, '  '))).toHaveLength(2);
  });

  it('labels types and lays fields out as rows without following a cycle', () => {
    expect(typeLabel(doc, { type: 'string', format: 'uuid' })).toBe('string (uuid)');
    expect(typeLabel(doc, { enum: ['kg', 'lb'] })).toBe('"kg" | "lb"');
    expect(typeLabel(doc, { type: 'array', items: { enum: ['a', 'b'] } })).toBe('("a" | "b")[]');
    expect(typeLabel(doc, { type: 'array', items: { $ref: '#/components/schemas/Mark' } })).toBe('Mark[]');
    expect(typeLabel(doc, { type: 'object', additionalProperties: { type: 'boolean' } })).toBe(
      'map of boolean',
    );

    const rows = schemaRows(doc, {
      type: 'object',
      required: ['data'],
      properties: { data: { $ref: '#/components/schemas/Mark' } },
    });
    expect(rows.map((r) => [r.name, r.type, r.required])).toEqual([
      ['data', 'Mark', true],
      ['data.id', 'string (uuid)', true],
      ['data.note', 'string | null', false],
      // Mark inside Mark: named, not opened again.
      ['data.replies', 'Mark[]', true],
    ]);
    expect(rows[1]!.description).toBe('Mark id.');
  });
});
