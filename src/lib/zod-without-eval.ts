import { z } from 'zod';

/**
 * Imported first by main.tsx, before any schema is used: the Content-Security-Policy forbids eval, and
 * zod's one-time probe for it (`Function('')`) would be reported as a policy violation even though zod
 * catches the refusal. `jitless` skips the probe; parsing works the same.
 */
z.config({ jitless: true });
