import { describe, expect, it } from "vitest";
import { scaleBufferPoolBytes } from "./buffer-pool";

const gigabyte = 1024 ** 3;

describe("the scale group's buffer pool", () => {
  it("asks for 3 GB where the machine has four times that", () => {
    expect(scaleBufferPoolBytes(24 * gigabyte)).toBe(3 * gigabyte);
    expect(scaleBufferPoolBytes(12 * gigabyte)).toBe(3 * gigabyte);
  });

  it("asks for a quarter of a smaller machine's memory, in whole 128 MB chunks", () => {
    expect(scaleBufferPoolBytes(8 * gigabyte)).toBe(2 * gigabyte);
    // 7.9 GB ÷ 4 = 2022.4 MB → 1920 MB (15 chunks of 128 MB).
    expect(scaleBufferPoolBytes(7.9 * gigabyte)).toBe(1920 * 1024 ** 2);
  });
});
