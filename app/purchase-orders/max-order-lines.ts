/** Most lines one order takes on a page (zod-free: the order forms' editor shows it before the schema loads). */
export const maxOrderLines = 200;
