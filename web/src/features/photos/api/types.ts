import type { photoView } from '@driftmark/shared';
import type { z } from 'zod';

/** One condition photo as the API sends it (shared `photoView`). */
export type PhotoView = z.infer<typeof photoView>;
