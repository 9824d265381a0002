import { connection, NextResponse } from "next/server";
import { signFormToken, type FormTokenAnswer } from "@/lib/quotes/form-token";

/** Public: `{"renderedAt": "<signed token>"}`, fetched by the request form when it opens and posted back with it. */
export async function GET() {
  await connection();
  const answer: FormTokenAnswer = { renderedAt: signFormToken(Date.now()) };
  return NextResponse.json(answer, { headers: { "Cache-Control": "no-store" } });
}
