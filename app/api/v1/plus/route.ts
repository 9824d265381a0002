import { connection, NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db/client";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { answerPlus, plusQuerySchema, toPlusBody } from "@/lib/plus/plus-request";

export async function GET(request: NextRequest) {
  await connection();
  const query = parseQuery(request.nextUrl, plusQuerySchema);
  if (!query.ok) return query.response;
  const answer = await answerPlus(await getDb(), query.value);
  return answer.ok ? NextResponse.json(toPlusBody(answer.plan)) : apiError(answer.code, answer.message);
}
