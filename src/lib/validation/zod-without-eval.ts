import { z } from 'zod';

// zod compiles object parsers with `new Function` where it may, and probes for that ability first. The portal's
// Content-Security-Policy forbids eval, so in the browser the probe itself is reported as a violation; the
// interpreted parser gives the same answers, so it is used everywhere.
z.config({ jitless: true });
