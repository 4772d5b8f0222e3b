"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import type { DrillDto } from "@/lib/knots/dto";
import type { GenerateRequestInput } from "@/lib/knots/generate-request";
import { drillKeys } from "@/lib/query-keys";

export interface KnotDrillsResponse {
  drills: DrillDto[];
  skipped: { family: string; reason: string }[];
}

export class RequestProblem extends Error {
  constructor(message: string, readonly problems: string[]) {
    super(message);
  }
}

async function fetchDrills(knotId: string, request: GenerateRequestInput): Promise<KnotDrillsResponse> {
  const res = await fetch(`/api/knots/${encodeURIComponent(knotId)}/drills`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify(request),
  });
  const body = await res.json().catch(() => ({}));
  if (!res.ok) throw new RequestProblem(body.message ?? `Generating failed (${res.status}).`, body.problems ?? []);
  return body as KnotDrillsResponse;
}

/** Previews for a knot and request; null request = not generated yet. A new request refetches, keeping the old previews meanwhile. */
export function useKnotDrills(knotId: string, request: GenerateRequestInput | null) {
  return useQuery({
    queryKey: drillKeys.preview(knotId, request),
    queryFn: () => fetchDrills(knotId, request!),
    enabled: request !== null,
    placeholderData: keepPreviousData,
    retry: false,
  });
}
