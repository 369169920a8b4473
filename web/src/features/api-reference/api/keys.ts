export const apiReferenceKeys = {
  all: ['api-reference'] as const,
  /** The OpenAPI description the server makes from its own router. */
  description: () => [...apiReferenceKeys.all, 'description'] as const,
};
