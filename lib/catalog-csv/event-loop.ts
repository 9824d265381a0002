/**
 * Lets the server's other requests run before the next step of a long job. The embedded database
 * and the parsing both run on Node's one main thread: a step that never yields stalls every request,
 * even one that needs no database.
 */
export const yieldToEventLoop = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));
