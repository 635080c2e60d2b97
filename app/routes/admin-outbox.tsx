import { createColumnHelper } from "~/lib/table-columns";
import { z } from "zod";
import type { Route } from "./+types/admin-outbox";
import { requireCapability } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  FilterChoice,
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { readPageOrLast } from "~/lib/search-params";
import {
  isFiltered,
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { listOutbox, outboxPageSize } from "~/mail/outbox.server";

const outboxListSchema = searchPageSchema.extend({
  state: z
    .enum(["sent", "unsent"], { error: "state must be sent or unsent." })
    .optional(),
});

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "readOutbox");
  const { query, ignored } = readListFilters(
    outboxListSchema,
    new URL(request.url).searchParams,
  );
  const { page: asked, ...filter } = query;
  const { total, messages, page, pageCount } = await readPageOrLast(
    asked,
    outboxPageSize,
    (page) => listOutbox(page, outboxPageSize, filter),
  );
  return { messages, page, pageCount, total, filter, ignored };
}

export const meta: Route.MetaFunction = () => [
  { title: "Outbox · Turnledger" },
];

type Message = Route.ComponentProps["loaderData"]["messages"][number];
const column = createColumnHelper<Message>();
const columns = [
  column.accessor("createdAt", {
    header: "Written",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("to", { header: "To" }),
  column.display({
    id: "message",
    header: "Message",
    cell: ({ row }) => (
      <>
        <details>
          <summary className="cursor-pointer font-medium">
            {row.original.subject}
          </summary>
          <pre className="mt-2 whitespace-pre-wrap font-sans text-graphite-700">
            {row.original.text}
          </pre>
        </details>
        {row.original.attachments.length > 0 ? (
          <p className="mt-2 text-sm text-graphite-700">
            Attached:{" "}
            {row.original.attachments
              .map(
                (file) =>
                  `${file.fileName} (${formatQuantity(file.byteSize / 1024, "KB", 1)})`,
              )
              .join(", ")}
          </p>
        ) : null}
      </>
    ),
  }),
  column.display({
    id: "state",
    header: "Sent",
    cell: ({ row }) =>
      row.original.sentAt ? (
        <span className="whitespace-nowrap">
          {formatDateTime(row.original.sentAt)}
        </span>
      ) : (
        <span className="text-caution">
          Waiting ({row.original.attempts}{" "}
          {row.original.attempts === 1 ? "try" : "tries"})
          {/* Shown, not a hover title: keyboard and touch users read it too. */}
          {row.original.lastError ? (
            <span className="block max-w-56 text-xs break-words text-graphite-700">
              {row.original.lastError}
            </span>
          ) : null}
        </span>
      ),
  }),
];

export default function AdminOutbox({ loaderData }: Route.ComponentProps) {
  return (
    <section aria-labelledby="outbox-heading" className="space-y-4">
      <h1 id="outbox-heading" className="text-2xl font-semibold">
        Outbox
      </h1>
      <p className="mt-1 text-graphite-500">
        Every e-mail Turnledger has written, newest first ({loaderData.total} in
        all). Unsent ones go out with <code>npm run mail:retry</code>.
        Invitation and password links reach their recipient only: they are never
        shown here and are removed once a message is sent.
      </p>
      <ListSearchForm
        path="/admin/outbox"
        label="Search the outbox"
        search={{
          value: loaderData.filter.search,
          placeholder: "Recipient or subject",
        }}
        filtered={isFiltered(loaderData.filter)}
      >
        <FilterChoice
          name="state"
          label="State"
          value={loaderData.filter.state}
          options={[
            { value: "unsent", label: "Not sent yet" },
            { value: "sent", label: "Sent" },
          ]}
        />
      </ListSearchForm>
      <IgnoredFilters names={loaderData.ignored} />
      <DataTable
        caption="E-mail sent by Turnledger"
        columns={columns}
        rows={loaderData.messages}
        page={loaderData.page}
        pageCount={loaderData.pageCount}
        pageHref={(page) =>
          listHref("/admin/outbox", { ...loaderData.filter, page })
        }
        emptyText={
          <ListEmptyText
            filtered={isFiltered(loaderData.filter)}
            clearHref="/admin/outbox"
            emptyText="No e-mail yet."
          />
        }
      />
    </section>
  );
}
