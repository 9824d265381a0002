import { connection, NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db/client";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { answerAlternatives } from "@/lib/catalog/alternatives-request";
import { alternativesQuerySchema } from "@/lib/catalog/api-queries";

export async function GET(request: NextRequest) {
  await connection();
  const query = parseQuery(request.nextUrl, alternativesQuerySchema);
  if (!query.ok) return query.response;
  const answer = await answerAlternatives(await getDb(), query.value);
  return answer.ok ? NextResponse.json(answer.body) : apiError(answer.code, answer.message);
}
