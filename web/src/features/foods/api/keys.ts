import type { QueryKey } from '@tanstack/react-query';

/** Keys other features hold that a new food changes (the food search); the route passes them in. */
export type LinkedKeys = readonly QueryKey[];
