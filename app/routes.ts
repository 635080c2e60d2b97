import {
  type RouteConfig,
  index,
  layout,
  prefix,
  route,
} from "@react-router/dev/routes";

export default [
  // Pages for signed-in people, inside the app shell.
  layout("routes/app-shell.tsx", [
    index("routes/home.tsx"),
    route("admin/people", "routes/admin-people.tsx"),
    route("admin/people/:userId", "routes/admin-person.tsx"),
    route("admin/outbox", "routes/admin-outbox.tsx"),
    route("account", "routes/account.tsx"),
    // The API's reference (its contract rendered); every other path under /api is the API's.
    route("api", "routes/api-reference.tsx"),
    route("tools/coil-estimator", "routes/coil-estimator.tsx"),
    route("tools/magnet-estimator", "routes/magnet-estimator.tsx"),
    route("reference", "routes/reference.tsx"),
    ...prefix("suppliers", [
      index("routes/suppliers.tsx"),
      route("import", "routes/price-import.tsx"),
      route("imports", "routes/price-imports.tsx"),
      route(
        "imports/:importId/lines.csv",
        "routes/price-import-lines-export.ts",
      ),
      route(":supplierId", "routes/supplier.tsx"),
    ]),
    route("prices", "routes/prices.tsx"),
    route("best-prices", "routes/best-prices.tsx"),
    ...prefix("designs", [
      index("routes/designs.tsx"),
      route(":designId/revisions/:revision", "routes/design-revision.tsx"),
      route(
        ":designId/revisions/:revision/bom.csv",
        "routes/design-bom-export.ts",
      ),
      route(
        ":designId/revisions/:revision/print",
        "routes/design-bom-print.tsx",
      ),
    ]),
    route("insight", "routes/insight.tsx"),
    route("insight/csv/:table", "routes/insight-export.ts"),
    ...prefix("purchase-orders", [
      index("routes/purchase-orders.tsx"),
      route("new", "routes/purchase-order-new.tsx"),
      // Fixed paths ("late") before ":orderId".
      route(":orderId", "routes/purchase-order.tsx"),
      route(":orderId/print", "routes/purchase-order-print.tsx"),
    ]),
    route("alerts", "routes/alerts.tsx"),
    route("alerts/purchase-request.csv", "routes/alerts-purchase-request.ts"),
    // Before any purchase-orders/:orderId route, so "late" is never taken for an order id.
    route("purchase-orders/late", "routes/purchase-orders-late.tsx"),
    ...prefix("build-orders", [
      index("routes/build-orders.tsx"),
      // Before ":orderId", so "export.csv" is never taken for an order id.
      route("export.csv", "routes/build-orders-export.ts"),
      route(":orderId", "routes/build-order.tsx"),
      route(":orderId/lots.csv", "routes/build-order-lots-export.ts"),
      route(":orderId/pick-list", "routes/build-order-pick-list.tsx"),
    ]),
    route("buying-plan", "routes/buying-plan.tsx"),
    ...prefix("stocktakes", [
      index("routes/stocktakes.tsx"),
      route(":stocktakeId", "routes/stocktake.tsx"),
      route(":stocktakeId/count", "routes/stocktake-count.tsx"),
      route(":stocktakeId/print", "routes/stocktake-print.tsx"),
    ]),
    // Labels and scanning (issue 20): printable labels, and where a label's QR code leads.
    ...prefix("labels", [
      route("lots", "routes/labels-lots.tsx"),
      route("lots/:lotId", "routes/label-lot.tsx"),
      route("locations", "routes/labels-locations.tsx"),
      route("locations/:code", "routes/label-location.tsx"),
    ]),
    route("scan/:code", "routes/scan.tsx"),
    ...prefix("stock", [
      index("routes/stock.tsx"),
      route("export.csv", "routes/stock-export.ts"),
      route("items/new", "routes/stock-item-new.tsx"),
      route("items/:sku", "routes/stock-item.tsx"),
      route("record", "routes/stock-record.tsx"),
      route("receive", "routes/stock-receive.tsx"),
      route("journal", "routes/stock-journal.tsx"),
      route("journal.csv", "routes/stock-journal-export.ts"),
      route("locations/:code/count-sheet", "routes/location-count-sheet.tsx"),
      // Lots: origin, certificates, where used (issue 20).
      route("lots/:lotId", "routes/stock-lot.tsx"),
      route(
        "lots/:lotId/documents/:documentId",
        "routes/stock-lot-document.ts",
      ),
      route("lots/:lotId/where-used.csv", "routes/stock-lot-where-used.ts"),
      route("lots/:lotId/hold", "routes/stock-lot-hold.ts"),
      route("lots/:lotId/release", "routes/stock-lot-release.ts"),
    ]),
  ]),

  // Account pages anyone can reach.
  route("sign-in", "routes/sign-in.tsx"),
  route("sign-out", "routes/sign-out.tsx"),
  route("forgot-password", "routes/forgot-password.tsx"),
  route("set-password", "routes/set-password.tsx"),

  // Machine-readable routes.
  route("healthz", "routes/healthz.ts"),
  route("readyz", "routes/readyz.ts"),
  ...prefix("api/v1", [
    route("openapi.json", "routes/api.v1.openapi.ts"),
    route("sessions", "routes/api.v1.sessions.ts"),
    route("me", "routes/api.v1.me.ts"),
    route("outbox", "routes/api.v1.outbox.ts"),
    route("coil-estimates", "routes/api.v1.coil-estimates.ts"),
    route("magnet-estimates", "routes/api.v1.magnet-estimates.ts"),
    route("winding-factors", "routes/api.v1.winding-factors.ts"),
    route("slot-fills", "routes/api.v1.slot-fills.ts"),
    route("wire-sizes", "routes/api.v1.wire-sizes.ts"),
    route("magnet-grades", "routes/api.v1.magnet-grades.ts"),
    route("items", "routes/api.v1.items.ts"),
    route("items/:sku", "routes/api.v1.item.ts"),
    route("locations", "routes/api.v1.locations.ts"),
    route("scan-lookup", "routes/api.v1.scan-lookup.ts"),
    route("stock-movements", "routes/api.v1.stock-movements.ts"),
    route("lots/:lot/hold", "routes/api.v1.lot-hold.ts"),
    route("lots/:lot/release", "routes/api.v1.lot-release.ts"),
    route("suppliers", "routes/api.v1.suppliers.ts"),
    route("suppliers/:supplierId", "routes/api.v1.supplier.ts"),
    route("price-lists", "routes/api.v1.price-lists.ts"),
    route("metal-base", "routes/api.v1.metal-base.ts"),
    route("currency-rates", "routes/api.v1.currency-rates.ts"),
    route("items/:sku/prices", "routes/api.v1.item-prices.ts"),
    route("designs", "routes/api.v1.designs.ts"),
    route("designs/:designId", "routes/api.v1.design.ts"),
    route("designs/:designId/revisions", "routes/api.v1.design-revisions.ts"),
    route(
      "designs/:designId/revisions/:revision",
      "routes/api.v1.design-revision.ts",
    ),
    route(
      "designs/:designId/revisions/:revision/release",
      "routes/api.v1.design-revision-release.ts",
    ),
    route(
      "designs/:designId/revisions/:revision/costing",
      "routes/api.v1.design-costing.ts",
    ),
    route(
      "designs/:designId/revisions/:revision/lines/:line/substitutes",
      "routes/api.v1.design-line-substitutes.ts",
    ),
    route("alerts", "routes/api.v1.alerts.ts"),
    route("insight/designs", "routes/api.v1.insight-designs.ts"),
    route("insight/stock-value", "routes/api.v1.insight-stock-value.ts"),
    route("build-orders", "routes/api.v1.build-orders.ts"),
    route("build-orders/:orderId", "routes/api.v1.build-order.ts"),
    route("build-orders/:orderId/:step", "routes/api.v1.build-order-step.ts"),
    // Lots: where used and certificates, by lot number (?sku= where it is ambiguous).
    route("lots/:lot/where-used", "routes/api.v1.lot-where-used.ts"),
    route("lots/:lot/documents", "routes/api.v1.lot-documents.ts"),
    route("build-orders/:orderId/lots", "routes/api.v1.build-order-lots.ts"),
    route("buying-plan", "routes/api.v1.buying-plan.ts"),
    route("purchase-orders", "routes/api.v1.purchase-orders.ts"),
    route("purchase-orders/:orderId", "routes/api.v1.purchase-order.ts"),
    route(
      "purchase-orders/:orderId/send",
      "routes/api.v1.purchase-order-send.ts",
    ),
    route(
      "purchase-orders/:orderId/cancel",
      "routes/api.v1.purchase-order-cancel.ts",
    ),
    route(
      "purchase-orders/:orderId/close",
      "routes/api.v1.purchase-order-close.ts",
    ),
    route(
      "purchase-orders/:orderId/receipts",
      "routes/api.v1.purchase-order-receipts.ts",
    ),
    // Any other path under /api/v1: a JSON 404 for every method.
    route("*", "routes/api.v1.not-found.ts"),
  ]),

  // Other paths under /api (other versions than v1): the API's 404 too, never the HTML page.
  route("api/*", "routes/api.v1.not-found.ts", { id: "api-not-found" }),

  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
