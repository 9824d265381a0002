import pg from "pg";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { openServerPool } from "@/db/server-pool";
import { createServerDatabase } from "../helpers/server-database";

const serverUrl = process.env.TEST_DATABASE_URL;

// The pool exists only for a PostgreSQL server; like every server test, this runs where TEST_DATABASE_URL is set (CI sets it).
describe.skipIf(!serverUrl)("the PostgreSQL server pool", () => {
  const admin = new pg.Client({ connectionString: serverUrl });
  let database: Awaited<ReturnType<typeof createServerDatabase>>;
  const connectionsTo = async () =>
    Number((await admin.query("select count(*) from pg_stat_activity where datname = $1", [database.name])).rows[0].count);

  beforeAll(async () => {
    await admin.connect();
    database = await createServerDatabase(serverUrl!);
  });
  afterAll(async () => {
    await database?.drop();
    await admin.end();
  });

  it("closes only once every connection has ended, so the database can be dropped at once", async () => {
    const { pool, close } = openServerPool(database.url);
    const sockets: { destroyed: boolean }[] = [];
    pool.on("connect", (client) => sockets.push((client as unknown as { connection: { stream: { destroyed: boolean } } }).connection.stream));
    await Promise.all(Array.from({ length: 4 }, () => pool.query("select pg_sleep(0.05)")));
    expect(sockets).toHaveLength(4);
    await close();
    expect(sockets.every((socket) => socket.destroyed)).toBe(true);
    expect(await connectionsTo()).toBe(0);
  });

  it("survives the server dropping an idle connection, and reconnects for the next query", async () => {
    const { pool, close } = openServerPool(database.url);
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    try {
      await pool.query("select 1");
      await admin.query("select pg_terminate_backend(pid) from pg_stat_activity where datname = $1", [database.name]);
      await vi.waitFor(() => expect(logged).toHaveBeenCalledWith(expect.stringContaining("terminating connection")));
      expect((await pool.query("select 2 as two")).rows[0].two).toBe(2);
    } finally {
      logged.mockRestore();
      await close();
    }
  });
});
