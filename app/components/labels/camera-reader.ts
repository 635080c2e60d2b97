/**
 * Reading QR codes through the device's camera with @zxing/browser (plain JavaScript: no
 * WebAssembly and nothing fetched from elsewhere). The scan panel imports this module only
 * when someone presses "Use camera", so pages load without the reader.
 */
import { BrowserQRCodeReader } from "@zxing/browser";

export interface RunningCamera {
  stop: () => void;
}

/** How often a frame of the camera is read for a code, ms. */
const readEveryMs = 150;

/**
 * Starts the camera (the one facing away from the person when there are two) into `viewfinder`
 * and calls `onText` once with the first code read, then stops. Rejects with the browser's
 * own error (NotAllowedError, NotFoundError …) when the camera cannot start.
 *
 * Each frame is copied to a canvas the size the picture has at that moment (a camera may
 * start small and change size), every other one at half that size, then read by the
 * package's QR decoder.
 */
export async function startCameraReader(
  viewfinder: HTMLVideoElement,
  onText: (text: string) => void,
): Promise<RunningCamera> {
  if (!navigator.mediaDevices?.getUserMedia)
    throw new DOMException("No camera interface", "NotSupportedError");
  const stream = await navigator.mediaDevices.getUserMedia({
    video: { facingMode: "environment" },
    audio: false,
  });
  // Muted and inline, so browsers let the preview play without a fresh tap (autoplay rules).
  viewfinder.muted = true;
  viewfinder.playsInline = true;
  viewfinder.srcObject = stream;
  let stopped = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const stop = () => {
    stopped = true;
    clearTimeout(timer);
    for (const track of stream.getTracks()) track.stop();
    viewfinder.srcObject = null;
  };
  try {
    await viewfinder.play();
  } catch (error) {
    stop();
    throw error;
  }

  const reader = new BrowserQRCodeReader();
  const canvas = document.createElement("canvas");
  const context = canvas.getContext("2d", { willReadFrequently: true });
  let attempt = 0;
  const readFrame = () => {
    if (stopped || !context) return;
    if (viewfinder.videoWidth > 0 && viewfinder.videoHeight > 0) {
      // Every other frame at half size: the decoder finds some symbols only at fewer pixels a module.
      const scale = attempt++ % 2 === 0 ? 1 : 0.5;
      const width = Math.round(viewfinder.videoWidth * scale);
      const height = Math.round(viewfinder.videoHeight * scale);
      if (canvas.width !== width) canvas.width = width;
      if (canvas.height !== height) canvas.height = height;
      context.drawImage(viewfinder, 0, 0, width, height);
      try {
        const text = reader.decodeFromCanvas(canvas).getText();
        stop();
        onText(text);
        return;
      } catch {
        // No code in this frame (or not a readable one): try the next.
      }
    }
    timer = setTimeout(readFrame, readEveryMs);
  };
  readFrame();
  return { stop };
}
