import { type PGlite, protocol } from "@electric-sql/pglite";

const statementNames = new WeakMap<PGlite, Map<string, string>>();

function joined(...messages: Uint8Array[]): Uint8Array {
  const all = new Uint8Array(messages.reduce((length, message) => length + message.length, 0));
  let offset = 0;
  for (const message of messages) {
    all.set(message, offset);
    offset += message.length;
  }
  return all;
}

/** Parameters in PostgreSQL's text form; the statement's own casts and columns give their types. */
function asText(value: unknown): string | null {
  if (value === null || value === undefined) return null;
  if (typeof value === "boolean") return value ? "t" : "f";
  return String(value);
}

/**
 * Runs a read-only statement under a name, parsed once per database, and answers the first column
 * of its first row as text. PGlite's query() parses and plans every statement afresh (unnamed); a
 * named one lets PostgreSQL keep its plan, which for the finder is most of the work. It takes the
 * same two locks as query(), so it never runs inside another caller's transaction.
 */
export function firstValueOfNamedStatement(client: PGlite, text: string, values: readonly unknown[]): Promise<string | null> {
  return client._runExclusiveTransaction(() =>
    client.runExclusive(async () => {
      let names = statementNames.get(client);
      if (!names) {
        names = new Map();
        statementNames.set(client, names);
      }
      let name = names.get(text);
      if (!name) {
        name = `catalog_named_${names.size + 1}`;
        await client.execProtocol(joined(protocol.serialize.parse({ name, text }), protocol.serialize.sync()), { syncToFs: false });
        names.set(text, name);
      }
      const bound = protocol.serialize.bind({ statement: name, values: values.map(asText) });
      const { messages } = await client.execProtocol(joined(bound, protocol.serialize.execute({}), protocol.serialize.sync()), { syncToFs: false });
      const row = messages.find((message) => message instanceof protocol.messages.DataRowMessage);
      return row instanceof protocol.messages.DataRowMessage ? (row.fields[0] ?? null) : null;
    }),
  );
}
