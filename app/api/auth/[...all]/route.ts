import { toNextJsHandler } from "better-auth/next-js";
import { connection } from "next/server";
import { getAuth } from "@/lib/auth/auth";
import { handleAuthRequest } from "@/lib/auth/auth-route";

// better-auth's own endpoints (sign-up, sign-in, sign-out, session); each authorizes its own request.
async function handle(request: Request): Promise<Response> {
  await connection();
  return handleAuthRequest(request, toNextJsHandler(await getAuth()));
}

export const GET = handle;
export const POST = handle;
