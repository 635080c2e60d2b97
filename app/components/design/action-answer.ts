import type { SubmissionResult } from "@conform-to/react";
import type { DesignPageIntent } from "~/designs/design-page";

/** What the design page's action answers a fetcher (its forms show it beside their fields). */
export interface DesignActionAnswer {
  intent: DesignPageIntent | null;
  ok: boolean;
  /** A message for the whole change: released, refused, done. */
  message?: string;
  /** Conform's result for the form's fields. */
  result?: SubmissionResult<string[]>;
  /** save-line: the saved line's position, from 1. */
  position?: number;
}
