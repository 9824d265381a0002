import { NextResponse, type NextRequest } from "next/server";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { compareQuerySchema } from "@/lib/compare/compare-api";
import { readSizeList } from "@/lib/compare/read-sizes";
import { compareSizes } from "@/lib/tire";

export function GET(request: NextRequest) {
  const query = parseQuery(request.nextUrl, compareQuerySchema);
  if (!query.ok) return query.response;
  const list = readSizeList(query.value.sizes, 2);
  if (!list.ok) return apiError(list.code, list.message);
  return NextResponse.json({ sizes: compareSizes(list.sizes) }, { headers: { "Cache-Control": "public, max-age=86400" } });
}
