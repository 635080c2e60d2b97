/**
 * On the server, texts are formatted in the settings of the person the request is
 * answered for (noted by the guard, app/auth/guard.server.ts); API requests, scripts
 * and mail sent on a timer use the defaults. Imported by the guard, which every
 * loader and action calls first, so the source is in place before any page renders.
 */
import { currentRequest } from "~/observability/request-context.server";
import { defaultDisplaySettings } from "./display-settings";
import { setDisplaySettingsSource } from "./format";

setDisplaySettingsSource(
  () => currentRequest()?.display ?? defaultDisplaySettings,
);
