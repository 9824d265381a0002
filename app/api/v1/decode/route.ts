import { NextResponse, type NextRequest } from "next/server";
import { parseQuery } from "@/lib/api/query";
import { apiErrorStatus } from "@/lib/api/errors";
import { decodeQuerySchema } from "@/lib/decode/decode-api";
import { parseMarking, toDecodeResponse, toErrorBody } from "@/lib/tire";

// A pure function of the text; the day only moves a DOT code's age, so a day's caching is safe.
const cacheHeaders = { "Cache-Control": "public, max-age=3600, s-maxage=86400" };

export function GET(request: NextRequest) {
  const query = parseQuery(request.nextUrl, decodeQuerySchema);
  if (!query.ok) return query.response;
  const result = parseMarking(query.value.q, { today: new Date() });
  if (!result.ok) {
    return NextResponse.json(toErrorBody(result.error), { status: apiErrorStatus[result.error.code], headers: cacheHeaders });
  }
  return NextResponse.json(toDecodeResponse(result), { headers: cacheHeaders });
}
