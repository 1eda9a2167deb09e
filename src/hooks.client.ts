/**
 * Runs once when the app starts in the browser, before any page module is loaded.
 *
 * zod probes `new Function` when its first object schema is built, to decide whether it may compile
 * fast parsers. The Content-Security-Policy (svelte.config.js: no 'unsafe-eval') blocks the probe, and
 * although zod catches the error the browser still reports a policy violation. jitless parsing is the
 * same validation without the probe.
 */
import { z } from 'zod';

z.config({ jitless: true });
