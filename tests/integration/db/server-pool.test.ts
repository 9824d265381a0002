import { randomBytes } from "node:crypto";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { openServerPool } from "@/db/server-pool";

const serverUrl = process.env.TEST_DATABASE_URL;

describe.skipIf(!serverUrl)("the PostgreSQL server pool", () => {
  const name = `sidewise_pool_${randomBytes(6).toString("hex")}`;
  const admin = new pg.Client({ connectionString: serverUrl });
  const databaseUrl = () => {
    const url = new URL(serverUrl!);
    url.pathname = `/${name}`;
    return url.toString();
  };
  const connectionsTo = async () =>
    Number((await admin.query("select count(*) from pg_stat_activity where datname = $1", [name])).rows[0].count);

  beforeAll(async () => {
    await admin.connect();
    await admin.query(`create database ${name}`);
  });
  afterAll(async () => {
    await admin.query(`drop database if exists ${name} with (force)`);
    await admin.end();
  });

  it("closes only once every connection has ended, so the database can be dropped at once", async () => {
    const { pool, close } = openServerPool(databaseUrl());
    const sockets: { destroyed: boolean }[] = [];
    pool.on("connect", (client) => sockets.push((client as unknown as { connection: { stream: { destroyed: boolean } } }).connection.stream));
    await Promise.all(Array.from({ length: 4 }, () => pool.query("select pg_sleep(0.05)")));
    expect(sockets).toHaveLength(4);
    await close();
    expect(sockets.every((socket) => socket.destroyed)).toBe(true);
    expect(await connectionsTo()).toBe(0);
  });

  it("survives the server dropping an idle connection, and reconnects for the next query", async () => {
    const { pool, close } = openServerPool(databaseUrl());
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    try {
      await pool.query("select 1");
      await admin.query("select pg_terminate_backend(pid) from pg_stat_activity where datname = $1", [name]);
      await vi.waitFor(() => expect(logged).toHaveBeenCalledWith(expect.stringContaining("terminating connection")));
      expect((await pool.query("select 2 as two")).rows[0].two).toBe(2);
    } finally {
      logged.mockRestore();
      await close();
    }
  });
});
