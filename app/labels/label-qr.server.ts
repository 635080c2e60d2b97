/**
 * The QR code printed on a label, as SVG made on the server (npm `qrcode`): no script or
 * image is fetched to draw it, and it prints sharp at any size.
 *
 * Each symbol is read back before it is printed, with the decoder the record page's camera
 * uses (@zxing/library), at 2 to 10 pixels a module (a phone held near or far). That
 * decoder misses a few valid symbols at some sizes (about 2 in 100 of our addresses; e.g.
 * ".../scan/L27" at 4 px a module and more, which zbar reads), so where the mask pattern the
 * encoder picks is one of those, another of the eight masks (ISO/IEC 18004 §7.8) is used:
 * the same content, error correction and size, only the pattern differs.
 */
// @zxing/library is CommonJS whose names Node cannot see from an ES module: the server
// build imports it whole (named imports work under Vitest but fail in production).
import zxing from "@zxing/library";
import QRCode, { type QRCodeMaskPattern } from "qrcode";

const { BinaryBitmap, HybridBinarizer, QRCodeReader, RGBLuminanceSource } =
  zxing;

/** Level M: about 15 % of the symbol may be damaged or dirty and still read. */
const errorCorrectionLevel = "M";
/** The quiet zone of 4 modules ISO/IEC 18004 asks around the symbol. */
export const quietZoneModules = 4;
/** Pixels a module at which a symbol must read before it is printed. */
const checkedModuleSizes = [2, 3, 4, 5, 6, 8, 10];

export interface QrSymbol {
  /** Modules a side, without the quiet zone. */
  size: number;
  /** True for a dark module. */
  isDark: (row: number, column: number) => boolean;
  maskPattern: QRCodeMaskPattern | undefined;
}

function symbolOf(text: string, maskPattern?: QRCodeMaskPattern): QrSymbol {
  const code = QRCode.create(text, { errorCorrectionLevel, maskPattern });
  return {
    size: code.modules.size,
    isDark: (row, column) => Boolean(code.modules.get(row, column)),
    maskPattern: code.maskPattern,
  };
}

/** Whether the decoder reads `text` back from the symbol drawn at `scale` pixels a module. */
function readsAt(symbol: QrSymbol, text: string, scale: number): boolean {
  const side = (symbol.size + 2 * quietZoneModules) * scale;
  const pixels = new Uint8ClampedArray(side * side).fill(255);
  for (let row = 0; row < symbol.size; row++)
    for (let column = 0; column < symbol.size; column++) {
      if (!symbol.isDark(row, column)) continue;
      for (let dy = 0; dy < scale; dy++) {
        const start =
          ((row + quietZoneModules) * scale + dy) * side +
          (column + quietZoneModules) * scale;
        pixels.fill(0, start, start + scale);
      }
    }
  try {
    const source = new RGBLuminanceSource(pixels, side, side);
    const read = new QRCodeReader().decode(
      new BinaryBitmap(new HybridBinarizer(source)),
    );
    return read.getText() === text;
  } catch {
    return false;
  }
}

/** The symbol a label prints for `text`: the encoder's own, or the first mask the reader reads at every size. */
export function labelQrSymbol(text: string): QrSymbol {
  const automatic = symbolOf(text);
  const readable = (symbol: QrSymbol) =>
    checkedModuleSizes.every((scale) => readsAt(symbol, text, scale));
  if (readable(automatic)) return automatic;
  for (const mask of [0, 1, 2, 3, 4, 5, 6, 7] as const) {
    if (mask === automatic.maskPattern) continue;
    const other = symbolOf(text, mask);
    if (readable(other)) return other;
  }
  return automatic;
}

/** The label's QR symbol of a text as an SVG document sized by its viewBox (the page sets its size). */
export async function labelQrSvg(text: string): Promise<string> {
  return QRCode.toString(text, {
    type: "svg",
    errorCorrectionLevel,
    maskPattern: labelQrSymbol(text).maskPattern,
    margin: quietZoneModules,
    color: { dark: "#000000", light: "#ffffff" },
  });
}
