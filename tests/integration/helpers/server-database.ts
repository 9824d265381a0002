import { randomBytes } from "node:crypto";
import pg from "pg";

async function onServer(serverUrl: string, statement: string): Promise<void> {
  const admin = new pg.Client({ connectionString: serverUrl });
  await admin.connect();
  try {
    await admin.query(statement);
  } finally {
    await admin.end();
  }
}

/**
 * A new database on the server, empty or a copy of `template`: its address, and a way to drop it
 * (ending any connection left to it).
 */
export async function createServerDatabase(
  serverUrl: string,
  template?: string,
): Promise<{ name: string; url: string; drop: () => Promise<void> }> {
  const name = `sidewise_test_${randomBytes(6).toString("hex")}`;
  await onServer(serverUrl, template ? `create database ${name} template ${template}` : `create database ${name}`);
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return { name, url: url.toString(), drop: () => onServer(serverUrl, `drop database if exists ${name} with (force)`) };
}
