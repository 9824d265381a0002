import { toNextJsHandler } from "better-auth/next-js";
import { connection } from "next/server";
import { getAuth } from "@/lib/auth/auth";

// better-auth's own endpoints (sign-up, sign-in, sign-out, session); each authorizes its own request.
async function handle(request: Request): Promise<Response> {
  await connection();
  const handlers = toNextJsHandler(await getAuth());
  return request.method === "GET" ? handlers.GET(request) : handlers.POST(request);
}

export const GET = handle;
export const POST = handle;
