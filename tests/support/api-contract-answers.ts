/** Checking many answers at once against the contract: each its expected status and a conforming body. */
import { expect } from "vitest";
import { expectConforming } from "./api-contract";

/** An answer, the method and path template it was asked of, and the status it must have. */
export type ExpectedAnswer = [
  response: Response,
  method: string,
  pathTemplate: string,
  status: number,
];

export async function expectAnswersConforming(
  answers: ExpectedAnswer[],
): Promise<void> {
  for (const [response, method, pathTemplate, status] of answers) {
    expect(
      response.status,
      `${method} ${response.url}: ${await response.clone().text()}`,
    ).toBe(status);
    await expectConforming(response, method, pathTemplate);
  }
}
