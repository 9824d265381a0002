import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { answerPlus, plusQuerySchema, toPlusBody } from "@/lib/plus/plus-request";

export const GET = withRoute({ role: "public", query: plusQuerySchema }, async ({ db, query }) => {
  const answer = await answerPlus(db, query);
  return answer.ok ? NextResponse.json(toPlusBody(answer.plan)) : apiError(answer.code, answer.message);
});
