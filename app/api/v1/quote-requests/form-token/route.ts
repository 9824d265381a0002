import { connection, NextResponse } from "next/server";
import { signFormToken } from "@/lib/quotes/form-token";

/** Public: `{"renderedAt": "<signed token>"}`, fetched by the request form when it opens and posted back with it. */
export async function GET() {
  await connection();
  return NextResponse.json({ renderedAt: signFormToken(Date.now()) }, { headers: { "Cache-Control": "no-store" } });
}
