/** The browser's call to POST /api/v1/magnet-estimates with the typed client (see app/lib/api-request.ts). */
import type { MagnetEstimate } from "~/engineering/magnet-estimate";
import { apiClient } from "~/api-client/client";
import { apiAnswer } from "~/lib/api-request";
import type { EstimatedInput } from "./magnet-estimate-results";

export type EstimateAnswer =
  | { ok: true; estimate: MagnetEstimate; input: EstimatedInput }
  | {
      ok: false;
      status: number;
      message: string;
      fields: Record<string, string[]>;
    };

export async function requestMagnetEstimate(
  input: EstimatedInput,
  signal: AbortSignal,
): Promise<EstimateAnswer> {
  const answer = await apiAnswer(
    apiClient.POST("/api/v1/magnet-estimates", { body: input, signal }),
    signal,
  );
  return answer.ok ? { ok: true, estimate: answer.data, input } : answer;
}
