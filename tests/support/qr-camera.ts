/**
 * QR codes for the browser tests: read a label's QR code (its SVG drawn on a canvas in the
 * page) with @zxing/library, the package the app's camera reader is built on, and write a
 * QR code as a Y4M video file that Chromium plays as a fake camera
 * (`--use-file-for-fake-video-capture`).
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import {
  BinaryBitmap,
  HybridBinarizer,
  QRCodeReader,
  RGBLuminanceSource,
} from "@zxing/library";
import type { Locator } from "playwright-core";
import QRCode from "qrcode";

/** The text of the QR code drawn by the SVG inside `qr`, read from the page's own pixels. */
export async function readQrCodeIn(qr: Locator): Promise<string> {
  const { size, grey } = await qr.evaluate(async (element) => {
    const svg = element.querySelector("svg")!.outerHTML;
    const image = new Image();
    image.src = `data:image/svg+xml;base64,${btoa(svg)}`;
    await image.decode();
    const side = 400;
    const canvas = document.createElement("canvas");
    canvas.width = side;
    canvas.height = side;
    const context = canvas.getContext("2d")!;
    context.imageSmoothingEnabled = false;
    context.drawImage(image, 0, 0, side, side);
    const rgba = context.getImageData(0, 0, side, side).data;
    const values: number[] = [];
    for (let i = 0; i < rgba.length; i += 4) values.push(rgba[i + 1]!);
    return { size: side, grey: values };
  });
  const source = new RGBLuminanceSource(
    Uint8ClampedArray.from(grey),
    size,
    size,
  );
  return new QRCodeReader()
    .decode(new BinaryBitmap(new HybridBinarizer(source)))
    .getText();
}

/**
 * A Y4M file (the YUV4MPEG2 header, then frames of raw I420: the full-size luma plane and
 * the two quarter-size chroma planes) showing the QR code of `text` black on white in the
 * middle of a 640 × 480 picture. Returns its path.
 */
export function qrCodeVideoFile(text: string): string {
  const width = 640;
  const height = 480;
  const symbol = QRCode.create(text, { errorCorrectionLevel: "M" }).modules;
  const quiet = 4;
  const scale = Math.floor(360 / (symbol.size + 2 * quiet));
  const side = (symbol.size + 2 * quiet) * scale;
  const left = Math.floor((width - side) / 2);
  const top = Math.floor((height - side) / 2);
  const luma = Buffer.alloc(width * height, 235);
  for (let row = 0; row < symbol.size; row++)
    for (let column = 0; column < symbol.size; column++) {
      if (!symbol.get(row, column)) continue;
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
