/**
 * The item page's forms (item-change-forms.tsx) as lazy components, one chunk for
 * both, fetched as soon as this module runs (in the browser before hydration reaches
 * them). The server renders them whole into the page; until their code has come
 * React keeps the server's forms in place and they are sent as without JavaScript
 * (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
import { lazy } from "react";

const loadForms = () => import("./item-change-forms");

void loadForms();

export const ReorderPointForm = lazy(() =>
  loadForms().then((module) => ({ default: module.ReorderPointForm })),
);

export const RenameItemForm = lazy(() =>
  loadForms().then((module) => ({ default: module.RenameItemForm })),
);
