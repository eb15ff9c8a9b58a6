import * as z from "zod/mini";

// In the browser zod probes whether it may compile parsers with `new Function`; the CSP forbids
// eval, and the browser reports even that caught probe as a violation. Jitless skips the probe
// (zod's own advice). Global to zod (mini and classic share it); the server keeps the fast path.
if (typeof window !== "undefined") z.config({ jitless: true });
