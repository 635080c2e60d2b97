import { Link } from "react-router";
import type { Route } from "./+types/home";
import { countOpenAlertsByCover } from "~/alerts/stock-alerts.server";
import { requireUser } from "~/auth/guard.server";
import { InsightDesigns } from "~/components/insight/insight-designs";
import { StockHeadline } from "~/components/insight-stock";
import { loadInsight } from "~/insight/insight-page.server";
import { adminFigures } from "~/people/admin-figures.server";
import { roleDuties } from "~/lib/navigation";
import { userCan } from "~/lib/capabilities";
import { roles, roleLabels } from "~/lib/roles";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const isAdmin = user.roles.includes("admin");
  // Managers start on the cost insight (designs with the what-if, stock value); the
  // trends and breakdowns are on /insight.
  const isManager = user.roles.includes("manager");
  // Buyers (and admins) start from what is low: the open alerts, linked to the alerts page.
  const isBuyer = userCan(user, "hearLowStockAlerts");
  const [admin, insight, openAlerts] = await Promise.all([
    isAdmin ? adminFigures() : null,
    isManager ? loadInsight(request, { page: "start" }) : null,
    isBuyer ? countOpenAlertsByCover() : null,
  ]);
  return {
    name: user.name,
    roles: roles.filter((role) => user.roles.includes(role)),
    admin,
    insight,
    openAlerts,
  };
}

export const meta: Route.MetaFunction = () => [{ title: "Start · Turnledger" }];

function Figure({
  label,
  value,
  to,
}: {
  label: string;
  value: number;
  to: string;
}) {
  return (
    <Link
      to={to}
      className="block rounded-md border border-rule bg-white px-4 py-3 hover:border-copper-300"
    >
      <span className="block text-2xl font-semibold">{value}</span>
      <span className="text-sm text-graphite-500">{label}</span>
    </Link>
  );
}

export default function Home({ loaderData }: Route.ComponentProps) {
  const { name, roles: myRoles, admin, insight, openAlerts } = loaderData;
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">
          Good to see you, {name.split(" ")[0]}
        </h1>
        <p className="mt-1 text-graphite-500">
          {myRoles.length > 0
            ? `You work here as ${myRoles.map((role) => roleLabels[role].toLowerCase()).join(" and ")}.`
            : "You hold no role yet, so you can only read. Ask an admin to give you one."}
        </p>
      </div>
      {openAlerts !== null ? (
        <section aria-labelledby="low-stock-figures" className="panel">
          <h2 id="low-stock-figures" className="mb-3 text-lg font-semibold">
            Low stock
          </h2>
          <div className="grid gap-3 sm:grid-cols-4">
            <Figure
              label={
                openAlerts.toOrder === 1
                  ? "open low-stock alert to order"
                  : "open low-stock alerts to order"
              }
              value={openAlerts.toOrder}
              to="/alerts"
            />
            <Figure
              label={
                openAlerts.covered === 1
                  ? "low item covered by a sent order"
                  : "low items covered by sent orders"
              }
              value={openAlerts.covered}
              to="/alerts"
            />
          </div>
        </section>
      ) : null}
      {admin ? (
        <section aria-labelledby="admin-figures" className="panel">
          <h2 id="admin-figures" className="mb-3 text-lg font-semibold">
            Accounts and mail
          </h2>
          <div className="grid gap-3 sm:grid-cols-4">
            <Figure
              label="people active"
              value={admin.activePeople}
              to="/admin/people"
            />
            <Figure
              label="invited, no password yet"
              value={admin.pendingInvitations}
              to="/admin/people"
            />
            <Figure
              label="deactivated"
              value={admin.deactivatedPeople}
              to="/admin/people"
            />
            <Figure
              label="e-mails waiting to send"
              value={admin.unsentMail}
              to="/admin/outbox"
            />
          </div>
        </section>
      ) : null}
      {insight ? (
        <div className="space-y-8">
          <InsightDesigns data={insight} action="/" />
          <StockHeadline stock={insight.stock} />
          <p>
            <Link
              to="/insight"
              className="font-medium text-copper-700 underline underline-offset-2"
            >
              Open the cost insight
            </Link>{" "}
            <span className="text-graphite-500">
              for the cost per motor over the last year and the stock value by
              kind, location and week.
            </span>
          </p>
        </div>
      ) : null}
      <ul className="grid gap-4 md:grid-cols-2 lg:grid-cols-3">
        {myRoles.map((role) => (
          <li
            key={role}
            className="panel"
            aria-label={`${roleDuties[role].title} work`}
          >
            <h2 className="text-lg font-semibold text-copper-700">
              {roleDuties[role].title}
            </h2>
            <p className="mt-1 text-xs uppercase tracking-wide text-graphite-500">
              What you are trusted with
            </p>
            <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-graphite-700">
              {roleDuties[role].duties.map((duty) => (
                <li key={duty}>{duty}</li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
    </div>
  );
}
