import { NextResponse, type NextRequest } from "next/server";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { readCachedShopWearLimit32 } from "@/lib/shop/shop-cache";
import { evaluateWearMatch, wearMatchBody, wearMatchQuerySchema } from "@/lib/wear-match/wear-match-api";

export async function GET(request: NextRequest) {
  const query = parseQuery(request.nextUrl, wearMatchQuerySchema);
  if (!query.ok) return query.response;
  const evaluation = evaluateWearMatch(query.value, await readCachedShopWearLimit32());
  if (!evaluation.ok) return apiError(evaluation.code, evaluation.message, undefined, evaluation.field);
  return NextResponse.json(wearMatchBody(evaluation));
}
