import {
  data,
  Form,
  NavLink,
  Outlet,
  type ShouldRevalidateFunctionArgs,
} from "react-router";
import type { Route } from "./+types/app-shell";
import { requireUser } from "~/auth/guard.server";
import { sessionHeaders } from "~/auth/session-headers.server";
import { FlashMessage } from "~/components/flash-message";
import { RouteErrorNotice, RouteErrorPage } from "~/components/route-error";
import { takeFlash } from "~/lib/flash.server";
import { navigationItems, showsNavigationItem } from "~/lib/navigation";
import { roleLabels } from "~/lib/roles";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  // The one-time message after an action: taken here, for whichever page comes next.
  const { flash, setCookie } = await takeFlash(request, user);
  const headers = new Headers(await sessionHeaders(request));
  if (setCookie) headers.append("Set-Cookie", setCookie);
  return data({ user, flash }, { headers });
}

/** The estimators' live calculations change nothing on the server: the shell need not reload after them. */
export function shouldRevalidate({
  formAction,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  return formAction?.startsWith("/tools/") ? false : defaultShouldRevalidate;
}

/** Sends a refreshed session cookie (and the cleared message cookie) with the page. */
export const headers: Route.HeadersFunction = ({ loaderHeaders }) =>
  loaderHeaders;

export default function AppShell({ loaderData }: Route.ComponentProps) {
  return (
    <ShellFrame user={loaderData.user} flash={loaderData.flash}>
      <Outlet />
    </ShellFrame>
  );
}

/**
 * A page's refusal or failure (403, 404, 503…) under the header and menu. When the
 * shell itself could not load (no one signed in, the database down), the root's
 * error page shows it without them.
 */
export function ErrorBoundary({ error, loaderData }: Route.ErrorBoundaryProps) {
  if (!loaderData) return <RouteErrorPage error={error} />;
  return (
    <ShellFrame user={loaderData.user} flash={loaderData.flash}>
      <div className="mx-auto max-w-xl py-12">
        <RouteErrorNotice error={error} />
      </div>
    </ShellFrame>
  );
}

type ShellData = Route.ComponentProps["loaderData"];

/** The header with the person and the menu, the page in the middle, the footer. */
function ShellFrame({
  user,
  flash,
  children,
}: {
  user: ShellData["user"];
  flash: ShellData["flash"];
  children: React.ReactNode;
}) {
  const items = navigationItems.filter((item) =>
    showsNavigationItem(item, user),
  );
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-graphite-800 bg-graphite-900 text-graphite-50 print:hidden">
        {/* Two rows: the name and the person on top, the menu below with the whole width to itself. */}
        <div className="mx-auto flex max-w-7xl flex-wrap items-center justify-between gap-x-8 gap-y-2 px-4 pt-3 sm:px-6">
          <a
            href="/"
            className="flex items-center gap-2 text-lg font-semibold tracking-tight"
          >
            <img src="/favicon.svg" alt="" className="h-7 w-7" />
            Turnledger
          </a>
          <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
            <NavLink
              to="/account"
              className="hover:underline"
              title="Your account and API tokens"
            >
              <span className="font-medium">{user.name}</span>
              <span className="ml-2 text-graphite-300">
                {user.roles.map((role) => roleLabels[role]).join(" · ")}
              </span>
            </NavLink>
            <Form method="post" action="/sign-out">
              <button
                type="submit"
                className="rounded-md border border-graphite-500 px-3 py-1 text-graphite-100 hover:border-copper-300"
              >
                Sign out
              </button>
            </Form>
          </div>
        </div>
        <nav
          aria-label="Main"
          className="mx-auto max-w-7xl px-2 pt-2 pb-2 sm:px-4"
        >
          <ul className="flex flex-wrap gap-0.5">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.exact}
                  className={({ isActive }) =>
                    `block rounded-md px-2.5 py-1.5 text-sm font-medium ${
                      isActive
                        ? "bg-copper-600 text-white"
                        : "text-graphite-100 hover:bg-graphite-800"
                    }`
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
      </header>
      <main className="mx-auto w-full max-w-7xl flex-1 px-6 py-8">
        <FlashMessage flash={flash} />
        {children}
      </main>
      <footer className="border-t border-rule py-4 print:border-0 text-center text-xs text-graphite-500">
        Turnledger · figures are first-order engineering estimates; electrical
        safety and insulation follow local codes and licensed practice.
      </footer>
    </div>
  );
}
