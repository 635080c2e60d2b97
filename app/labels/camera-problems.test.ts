import { describe, expect, it } from "vitest";
import { cameraProblemText } from "./camera-problems";

describe("cameraProblemText", () => {
  it("says permission was refused, no camera, busy or none offered, from the browser's error name", () => {
    const named = (name: string) => Object.assign(new Error(name), { name });
    expect(cameraProblemText(named("NotAllowedError"))).toMatch(
      /permission was refused/,
    );
    expect(cameraProblemText(named("NotFoundError"))).toMatch(
      /No camera was found/,
    );
    expect(cameraProblemText(named("NotReadableError"))).toMatch(/in use/);
    expect(cameraProblemText(named("NotSupportedError"))).toMatch(/https/);
    expect(cameraProblemText("anything")).toMatch(/could not start/);
  });
});
