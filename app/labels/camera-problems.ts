/** What the scan panel says when the device's camera does not start. Pure. */

/** What to tell the person when the camera does not start, from the browser's error. */
export function cameraProblemText(error: unknown): string {
  const name =
    error instanceof Error || error instanceof DOMException ? error.name : "";
  if (name === "NotAllowedError" || name === "SecurityError")
    return "The camera is not allowed: permission was refused. Allow the camera for this site in the browser, or scan with a handheld scanner or type the code into the field.";
  if (
    name === "NotFoundError" ||
    name === "OverconstrainedError" ||
    name === "DevicesNotFoundError"
  )
    return "No camera was found on this device. Scan with a handheld scanner or type the code into the field.";
  if (name === "NotReadableError")
    return "The camera is in use by another program or could not start. Close it there and try again, or type the code into the field.";
  if (name === "NotSupportedError")
    return "This browser offers no camera here (a camera needs the https address of Turnledger). Scan with a handheld scanner or type the code into the field.";
  return "The camera could not start. Scan with a handheld scanner or type the code into the field.";
}
