/** Every table, for Drizzle and drizzle-kit. Each group lives in app/db/tables/. */
export * from "./tables/accounts";
export * from "./tables/reference";
export * from "./tables/stock";
export * from "./tables/stock-enums";
export * from "./tables/purchasing";
export * from "./tables/designs";
export * from "./tables/build-orders";
export * from "./tables/build-order-enums";
export * from "./tables/alerts";
export * from "./tables/alert-enums";
export * from "./tables/purchase-orders";
export * from "./tables/purchase-order-enums";
export * from "./tables/storeroom";
export * from "./tables/storeroom-enums";
