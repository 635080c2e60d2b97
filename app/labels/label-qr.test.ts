/**
 * The label's QR code, read back by an independent decoder (@zxing/library, the package the
 * record page's camera reads with) from a bitmap drawn from the SVG's own path.
 */
import {
  BinaryBitmap,
  HybridBinarizer,
  QRCodeReader,
  RGBLuminanceSource,
} from "@zxing/library";
import { describe, expect, it } from "vitest";
import { labelQrSvg } from "./label-qr.server";

/** Draws the SVG's dark modules (its "M x y h n" runs) into a grey bitmap, `scale` pixels a module. */
function bitmapOf(svg: string, scale: number) {
  const size = Number(/viewBox="0 0 (\d+) \d+"/.exec(svg)![1]);
  const width = size * scale;
  const pixels = new Uint8ClampedArray(width * width).fill(255);
  const dark = /<path stroke="#000000" d="([^"]+)"/.exec(svg)![1]!;
  let x = 0;
  let y = 0;
  for (const [, op, a, b] of dark.matchAll(
    /([Mmh])(-?[\d.]+)(?:\s(-?[\d.]+))?/g,
  )) {
    if (op === "M") [x, y] = [Number(a), Number(b)];
    else if (op === "m") [x, y] = [x + Number(a), y + Number(b)];
    else {
      const run = Number(a);
      const row = Math.floor(y);
      for (let column = x; column < x + run; column++)
        for (let dy = 0; dy < scale; dy++)
          for (let dx = 0; dx < scale; dx++)
            pixels[(row * scale + dy) * width + column * scale + dx] = 0;
      x += run;
    }
  }
  return { pixels, width };
}

function decode(svg: string, scale = 4): string {
  const { pixels, width } = bitmapOf(svg, scale);
  const source = new RGBLuminanceSource(pixels, width, width);
  return new QRCodeReader()
    .decode(new BinaryBitmap(new HybridBinarizer(source)))
    .getText();
}

describe("labelQrSvg", () => {
  it("draws a QR code that an independent reader decodes to the same address", async () => {
    for (const text of [
      "http://localhost:3000/scan/L123",
      "https://stores.example.com/scan/BWIRE-A1",
    ])
      expect(decode(await labelQrSvg(text))).toBe(text);
  });

  it("prints symbols the reader decodes at 2 to 10 pixels a module, also where the encoder's own mask is missed", async () => {
    // ".../scan/L27" and ".../scan/L62" with the encoder's automatic mask are not read by
    // @zxing/library at 4–10 px a module (zbarimg, an independent decoder, reads them): the
    // label takes another mask for them.
    for (const text of [
      "http://localhost:3123/scan/L27",
      "http://localhost:3123/scan/L62",
      "http://localhost:3123/scan/L61",
    ]) {
      const svg = await labelQrSvg(text);
      for (const scale of [2, 3, 4, 5, 6, 8, 10])
        expect(decode(svg, scale), `${text} at ${scale} px`).toBe(text);
    }
  });

  it("keeps the 4-module quiet zone around the symbol (ISO/IEC 18004)", async () => {
    const svg = await labelQrSvg("http://localhost:3000/scan/L1");
    // 29 bytes at level M: version 2-M holds 26 bytes, version 3-M (29 × 29 modules) 42, so
    // version 3 (ISO/IEC 18004 capacity table, as reprinted in Panasonic's LP-RV manual §15.4.2);
    // with the quiet zone 29 + 2 × 4 = 37 modules across.
    expect(svg).toContain('viewBox="0 0 37 37"');
    expect(svg).toMatch(/<path stroke="#000000" d="M4 4\.5h7/);
  });
});
