import type { Route } from "./+types/home";
import { requireUser } from "~/auth/guard.server";
import { roleStartNotes } from "~/lib/navigation";
import { roles } from "~/lib/roles";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  return { name: user.name, roles: roles.filter((role) => user.roles.includes(role)) };
}

export const meta: Route.MetaFunction = () => [{ title: "Start · Turnledger" }];

export default function Home({ loaderData }: Route.ComponentProps) {
  const { name, roles: myRoles } = loaderData;
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Good to see you, {name.split(" ")[0]}</h1>
        <p className="mt-1 text-graphite-500">
          Your work in Turnledger, by the roles you hold.
        </p>
      </div>
      {myRoles.length === 0 ? (
        <p className="panel">
          You hold no role yet, so you can only read. Ask an admin to give you one.
        </p>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2 lg:grid-cols-3">
          {myRoles.map((role) => (
            <li key={role} className="panel" aria-label={`${roleStartNotes[role].title} work`}>
              <h2 className="text-lg font-semibold text-copper-700">
                {roleStartNotes[role].title}
              </h2>
              <p className="mt-2 text-sm text-graphite-700">{roleStartNotes[role].text}</p>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
