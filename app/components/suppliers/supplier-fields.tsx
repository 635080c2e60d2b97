import type { FieldMetadata } from "@conform-to/react";
import { QuantityField } from "~/components/quantity-field";
import { TextAreaField } from "~/components/text-area-field";
import { TextField } from "~/components/text-field";
import { SupplierOrderingFields } from "./supplier-ordering-fields";
import {
  supplierCurrencyWarnings,
  type CurrencyCoverage,
} from "~/purchasing/supplier-currency-warnings";

/** What the currency lacks before this supplier's prices can be compared, as a list. */
export function SupplierCurrencyWarnings({
  currency,
  coverage,
}: {
  currency: string | undefined;
  coverage: CurrencyCoverage;
}) {
  const warnings = supplierCurrencyWarnings(currency, coverage);
  return (
    // Announced as the buyer types the code; empty while nothing is missing.
    <div aria-live="polite">
      {warnings.length > 0 ? (
        <div
          role="note"
          aria-label="Currency warnings"
          className="mt-2 rounded-md border border-caution/40 bg-caution/5 px-3 py-2 text-sm text-caution"
        >
          <ul className="list-disc space-y-1 pl-4">
            {warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
          <a
            href="/prices"
            className="mt-1 inline-block font-medium underline underline-offset-2"
          >
            Set rates and metal base
          </a>
        </div>
      ) : null}
    </div>
  );
}

/** The fields of a supplier, the same on the new-supplier and the edit form. */
export function SupplierFields({
  fields,
  coverage,
}: {
  fields: {
    name: FieldMetadata<string>;
    email: FieldMetadata<string | undefined>;
    currency: FieldMetadata<string>;
    leadTimeDays: FieldMetadata<number | undefined>;
    notes: FieldMetadata<string | undefined>;
    orderEmail: FieldMetadata<string | undefined>;
    metalBaseFixedAt: FieldMetadata<string>;
    wireTolerancePercent: FieldMetadata<number>;
    pieceTolerancePercent: FieldMetadata<number>;
  };
  coverage: CurrencyCoverage;
}) {
  return (
    <>
      <TextField field={fields.name} label="Name" autoComplete="off" />
      <TextField
        field={fields.email}
        label="E-mail"
        type="email"
        autoComplete="off"
      />
      <div>
        <TextField
          field={fields.currency}
          label="Quotes in (currency)"
          autoComplete="off"
          hint="3-letter ISO 4217 code, e.g. EUR, USD, CNY; € and £ are read as EUR and GBP."
        />
        <SupplierCurrencyWarnings
          currency={fields.currency.value}
          coverage={coverage}
        />
      </div>
      <QuantityField
        field={fields.leadTimeDays}
        label="Lead time"
        unit="days"
      />
      <TextAreaField field={fields.notes} label="Notes" />
      <SupplierOrderingFields fields={fields} />
    </>
  );
}
