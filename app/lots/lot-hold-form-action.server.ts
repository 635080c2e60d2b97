/**
 * The lot page's hold and release buttons post here (POST /stock/lots/:lotId/hold and
 * …/release, form field `reason`). Success redirects back to the lot's page with a
 * one-time message; a missing or overlong reason answers 400 with the field's message,
 * a lot in the wrong state 409 with the refusal above the form (Conform replies, for a
 * fetcher or a form on the lot page); an unknown lot is the 404 page.
 */
import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import { redirectWithFlash } from "~/lib/flash.server";
import { isDomainError } from "~/lib/domain-error";
import { refusalReply } from "~/lib/refusal-reply";
import { idFromText } from "~/lib/search-params";
import { holdLotSchema, releaseLotSchema } from "./lot-hold-requests";
import { findLotHold, holdLot, releaseLot } from "./lot-holds.server";

/** The lot's page. */
export const lotPagePath = (lotId: number) => `/stock/lots/${lotId}`;

/** The lot id of the path, or the 404 page. */
export async function lotIdOrNotFound(value: string | undefined) {
  const id = idFromText(value);
  if (id === null || !(await findLotHold(id)))
    throw data({ message: `No lot "${value ?? ""}".` }, { status: 404 });
  return id;
}

export async function lotHoldFormAction(
  request: Request,
  lotIdText: string | undefined,
  step: "hold" | "release",
  userId: string,
): Promise<Response | ReturnType<typeof data>> {
  const lotId = await lotIdOrNotFound(lotIdText);
  const formData = await request.formData();
  const submission = parseForm(formData, {
    schema: step === "hold" ? holdLotSchema : releaseLotSchema,
  });
  if (submission.status !== "success")
    return data({ step, result: submission.reply() }, { status: 400 });
  try {
    if (step === "hold")
      await holdLot(lotId, submission.value.reason ?? "", userId);
    else await releaseLot(lotId, submission.value.reason, userId);
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const result = refusalReply(submission, error.field, error.message);
    return data({ step, result }, { status: error.status });
  }
  return redirectWithFlash(lotPagePath(lotId), {
    code: step === "hold" ? "lot-held" : "lot-released",
    id: lotId,
  });
}
