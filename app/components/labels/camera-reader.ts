/**
 * Reading QR codes through the device's camera with @zxing/browser (plain JavaScript: no
 * WebAssembly and nothing fetched from elsewhere). The scan panel imports this module only
 * when someone presses "Use camera", so pages load without the reader.
 */
import { BrowserQRCodeReader } from "@zxing/browser";

export interface RunningCamera {
  stop: () => void;
}

/**
 * Starts the camera (the one facing away from the person when there are two) into `video`
 * and calls `onText` once with the first code read, then stops. Rejects with the browser's
 * own error (NotAllowedError, NotFoundError …) when the camera cannot start.
 */
export async function startCameraReader(
  video: HTMLVideoElement,
  onText: (text: string) => void,
): Promise<RunningCamera> {
  if (!navigator.mediaDevices?.getUserMedia)
    throw new DOMException("No camera interface", "NotSupportedError");
  const reader = new BrowserQRCodeReader(undefined, {
    delayBetweenScanAttempts: 150,
  });
  let done = false;
  const controls = await reader.decodeFromConstraints(
    { video: { facingMode: "environment" }, audio: false },
    video,
    (result, _error, running) => {
      // Frames without a code report an error each: only a result counts.
      if (!result || done) return;
      done = true;
      running.stop();
      onText(result.getText());
    },
  );
  return {
    stop: () => {
      done = true;
      controls.stop();
    },
  };
}
