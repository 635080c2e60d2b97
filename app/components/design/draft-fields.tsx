/**
 * The draft's motor figures form (DesignFieldsForm) and Conform's form hook load
 * after the design page (lazyPanel): most people open a released revision, which
 * shows the figures read-only (DesignFieldsSummary). The read-only figures also
 * hold the form's place after a navigation in the browser until its code has come.
 */
import { lazyPanel } from "~/components/lazy-panel";
import type { DesignFieldsForm } from "./fields-form";
import { DesignFieldsSummary } from "./fields-summary";

export const DraftFields = lazyPanel<Parameters<typeof DesignFieldsForm>[0]>(
  () => import("./fields-form").then((module) => module.DesignFieldsForm),
  ({ revision }) => <DesignFieldsSummary revision={revision} />,
);
