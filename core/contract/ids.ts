import { z } from "zod";

/**
 * A UUID that a request names (a load case in a combination, a location of a state, …).
 * UUIDs are case-insensitive, but the server matches the ids it is sent against ids it has
 * read back (always lower case), so they are lower-cased at the boundary.
 */
export const uuidInput = (error: string) => z.uuid({ error }).transform((id) => id.toLowerCase());
