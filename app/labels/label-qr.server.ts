/**
 * The QR code printed on a label, as SVG made on the server (npm `qrcode`): no script or
 * image is fetched to draw it, and it prints sharp at any size.
 */
import QRCode from "qrcode";

/**
 * The QR symbol of a text as an SVG document sized by its viewBox (the page sets its
 * size). Error correction level M (about 15 % of the symbol may be damaged or dirty and
 * still read) and the quiet zone of 4 modules that ISO/IEC 18004 asks around the symbol.
 */
export async function labelQrSvg(text: string): Promise<string> {
  return QRCode.toString(text, {
    type: "svg",
    errorCorrectionLevel: "M",
    margin: 4,
    color: { dark: "#000000", light: "#ffffff" },
  });
}
