import { getDb } from "@/lib/database/app-database";
import { createAuth, type Auth } from "./create-auth";

export type { Auth } from "./create-auth";

type GlobalWithAuth = typeof globalThis & { __sidewiseAuth?: Promise<Auth> };

/** The app's sign-in service, created on first use over the app's database (which is itself opened lazily). */
export function getAuth(): Promise<Auth> {
  const store = globalThis as GlobalWithAuth;
  if (!store.__sidewiseAuth) {
    store.__sidewiseAuth = getDb()
      .then(createAuth)
      .catch((error: unknown) => {
        store.__sidewiseAuth = undefined;
        throw error;
      });
  }
  return store.__sidewiseAuth;
}
