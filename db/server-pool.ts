import pg from "pg";

/**
 * A connection pool to a PostgreSQL server whose `close` resolves only once every connection's
 * socket has ended, so the database can be dropped or the server stopped right after it.
 */
export function openServerPool(connectionString: string): { pool: pg.Pool; close: () => Promise<void> } {
  const pool = new pg.Pool({ connectionString, max: 10 });
  // The pool discards an idle connection the server drops (restart, failover, an administrator's
  // terminate); without a listener that error would be uncaught and end the whole process.
  pool.on("error", (error) => {
    if (!pool.ending) console.error(`PostgreSQL closed an idle connection: ${error.message}`);
  });
  const connected = new Set<pg.PoolClient>();
  let allEnded: (() => void) | undefined;
  pool.on("connect", (client) => connected.add(client));
  pool.on("remove", (client) => {
    connected.delete(client);
    if (connected.size === 0) allEnded?.();
  });

  const close = async () => {
    const ended = new Promise<void>((resolve) => {
      allEnded = resolve;
    });
    await pool.end();
    if (connected.size > 0) await ended;
  };
  return { pool, close };
}
