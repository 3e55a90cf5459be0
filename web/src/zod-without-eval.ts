import { z } from "zod";

// The server's Content-Security-Policy forbids eval. zod would otherwise probe `new Function`
// when it builds its first object schema (the throw is caught, but the browser reports a CSP
// violation) and compile parsers with it. main.tsx imports this first, before any schema exists.
z.config({ jitless: true });
