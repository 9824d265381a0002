import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { parseQuery } from "@/lib/api/query";
import { apiErrorStatus } from "@/lib/api/errors";
import { parseMarking, toDecodeResponse, toErrorBody } from "@/lib/tire";

const decodeQuery = z.object({ q: z.string().trim().min(1, "type something from a sidewall") });

// A pure function of the text; the day only moves a DOT code's age, so a day's caching is safe.
const cacheHeaders = { "Cache-Control": "public, max-age=3600, s-maxage=86400" };

export function GET(request: NextRequest) {
  const query = parseQuery(request.nextUrl, decodeQuery);
  if (!query.ok) return query.response;
  const result = parseMarking(query.value.q, { today: new Date() });
  if (!result.ok) {
    return NextResponse.json(toErrorBody(result.error), { status: apiErrorStatus[result.error.code], headers: cacheHeaders });
  }
  return NextResponse.json(toDecodeResponse(result), { headers: cacheHeaders });
}
