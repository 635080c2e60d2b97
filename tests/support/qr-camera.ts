/**
 * QR codes for the browser tests: read a label's QR code (as the page displays it) with
 * @zxing/library, the package the app's camera reader is built on, and write a
 * QR code as a Y4M file of camera frames that Chromium plays as its fake camera
 * (a command-line flag; see the camera test in tests/e2e/labels-and-scanning.test.ts).
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import {
  BinaryBitmap,
  DecodeHintType,
  GlobalHistogramBinarizer,
  HybridBinarizer,
  QRCodeReader,
  RGBLuminanceSource,
} from "@zxing/library";
import type { Locator } from "playwright-core";
import { labelQrSymbol, quietZoneModules } from "~/labels/label-qr.server";

/**
 * The text of the QR code shown by `qr`, read from the page as displayed: a screenshot of
 * the element (PNG), turned into grey pixels by the page's canvas and decoded here.
 *
 * On screen a label's symbol sits at a fraction of a pixel and its modules are a fraction
 * of a pixel wide (millimetres at 96 px an inch), so its edges are blurred grey. The
 * decoder misses about 3 in 100 such pictures at its default settings (measured over 400
 * random location addresses), so it tries its other binarizer and its harder search too,
 * as a phone's scanner keeps trying frame after frame. Each way must still read the
 * very text: only the way of looking differs.
 */
export async function readQrCodeIn(qr: Locator): Promise<string> {
  const png = (await qr.screenshot({ scale: "device" })).toString("base64");
  const { width, height, grey } = await qr.page().evaluate(async (data) => {
    const image = new Image();
    image.src = `data:image/png;base64,${data}`;
    await image.decode();
    const canvas = document.createElement("canvas");
    canvas.width = image.naturalWidth;
    canvas.height = image.naturalHeight;
    const context = canvas.getContext("2d")!;
    context.drawImage(image, 0, 0);
    const rgba = context.getImageData(0, 0, canvas.width, canvas.height).data;
    const values: number[] = [];
    for (let i = 0; i < rgba.length; i += 4) values.push(rgba[i + 1]!);
    return { width: canvas.width, height: canvas.height, grey: values };
  }, png);
  const source = new RGBLuminanceSource(
    Uint8ClampedArray.from(grey),
    width,
    height,
  );
  const harder = new Map<DecodeHintType, unknown>([
    [DecodeHintType.TRY_HARDER, true],
  ]);
  const pure = new Map<DecodeHintType, unknown>([
    [DecodeHintType.PURE_BARCODE, true],
  ]);
  const attempts = [
    () =>
      new QRCodeReader().decode(new BinaryBitmap(new HybridBinarizer(source))),
    () =>
      new QRCodeReader().decode(
        new BinaryBitmap(new GlobalHistogramBinarizer(source)),
      ),
    () =>
      new QRCodeReader().decode(
        new BinaryBitmap(new HybridBinarizer(source)),
        harder,
      ),
    () =>
      new QRCodeReader().decode(
        new BinaryBitmap(new HybridBinarizer(source)),
        pure,
      ),
  ];
  let firstError: unknown;
  for (const attempt of attempts) {
    try {
      return attempt().getText();
    } catch (error) {
      firstError ??= error;
    }
  }
  throw firstError;
}

/**
 * A Y4M file (the YUV4MPEG2 header, then frames of raw I420: the full-size luma plane and
 * the two quarter-size chroma planes) showing the label's QR code of `text` black on white
 * (luma 16 and 235, video range) in the middle of a 640 × 480 picture. Returns its path.
 */
export function qrCodeVideoFile(text: string): string {
  const width = 640;
  const height = 480;
  // The very symbol a label prints for the text (its mask chosen as the label's is).
  const symbol = labelQrSymbol(text);
  const quiet = quietZoneModules;
  const scale = Math.floor(360 / (symbol.size + 2 * quiet));
  const side = (symbol.size + 2 * quiet) * scale;
  const left = Math.floor((width - side) / 2);
  const top = Math.floor((height - side) / 2);
  const luma = Buffer.alloc(width * height, 235);
  for (let row = 0; row < symbol.size; row++)
    for (let column = 0; column < symbol.size; column++) {
      if (!symbol.isDark(row, column)) continue;
      for (let dy = 0; dy < scale; dy++) {
        const y = top + (row + quiet) * scale + dy;
        const x = left + (column + quiet) * scale;
        luma.fill(16, y * width + x, y * width + x + scale);
      }
    }
  const chroma = Buffer.alloc((width / 2) * (height / 2) * 2, 128);
  const frame = Buffer.concat([Buffer.from("FRAME\n"), luma, chroma]);
  const header = Buffer.from(
    `YUV4MPEG2 W${width} H${height} F10:1 Ip A1:1 C420\n`,
  );
  const file = path.join(
    fs.mkdtempSync(path.join(os.tmpdir(), "turnledger-camera-")),
    "qr.y4m",
  );
  fs.writeFileSync(file, Buffer.concat([header, ...Array(10).fill(frame)]));
  return file;
}
