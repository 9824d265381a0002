import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { answerAlternatives } from "@/lib/alternatives/answer-query";
import { alternativesQuerySchema } from "@/lib/alternatives/query-schema";

export const GET = withRoute({ role: "public", query: alternativesQuerySchema }, async ({ db, query }) => {
  const answer = await answerAlternatives(db, query);
  return answer.ok ? NextResponse.json(answer.body) : apiError(answer.code, answer.message);
});
