import { signInRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';

/** Loaded after the sign-in form is drawn (see sign-in-form.tsx): zod stays off the first screen. */
export const signInResolver = zodResolver(signInRequest);
