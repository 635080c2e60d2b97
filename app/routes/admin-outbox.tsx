import { createColumnHelper } from "@tanstack/react-table";
import type { Route } from "./+types/admin-outbox";
import { requireCapability } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { pageFromSearch, readPageOrLast } from "~/lib/search-params";
import { listOutbox, outboxPageSize } from "~/mail/outbox.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "readOutbox");
  const { total, messages, page, pageCount } = await readPageOrLast(
    pageFromSearch(new URL(request.url).searchParams.get("page")),
    outboxPageSize,
    (page) => listOutbox(page),
  );
  return { messages, page, pageCount, total };
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
    <section aria-labelledby="outbox-heading">
      <h1 id="outbox-heading" className="text-2xl font-semibold">
        Outbox
      </h1>
      <p className="mb-4 mt-1 text-graphite-500">
        Every e-mail Turnledger has written, newest first ({loaderData.total} in
        all). Unsent ones go out with <code>npm run mail:retry</code>.
        Invitation and password links reach their recipient only: they are never
        shown here and are removed once a message is sent.
      </p>
      <DataTable
        caption="E-mail sent by Turnledger"
        columns={columns}
        rows={loaderData.messages}
        page={loaderData.page}
        pageCount={loaderData.pageCount}
        pageHref={(page) => `?page=${page}`}
        emptyText="No e-mail yet."
      />
    </section>
  );
}
