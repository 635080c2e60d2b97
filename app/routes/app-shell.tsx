import { data, Outlet, type ShouldRevalidateFunctionArgs } from "react-router";
import type { Route } from "./+types/app-shell";
import { requireUser } from "~/auth/guard.server";
import { sessionHeaders } from "~/auth/session-headers.server";
import { FlashMessage } from "~/components/flash-message";
import { MainMenu } from "~/components/main-menu";
import { RouteErrorNotice, RouteErrorPage } from "~/components/route-error";
import { displaySettingsOf } from "~/lib/display-settings";
import { takeFlash } from "~/lib/flash.server";
import { setBrowserDisplaySettings } from "~/lib/format";
import { navigationItems, showsNavigationItem } from "~/lib/navigation";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  // The one-time message after an action: taken here, for whichever page comes next.
  const { flash, setCookie } = await takeFlash(request, user);
  const headers = new Headers(await sessionHeaders(request));
  if (setCookie) headers.append("Set-Cookie", setCookie);
  return data({ user, flash, display: displaySettingsOf(user) }, { headers });
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
    <ShellFrame
      user={loaderData.user}
      flash={loaderData.flash}
      display={loaderData.display}
    >
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
    <ShellFrame
      user={loaderData.user}
      flash={loaderData.flash}
      display={loaderData.display}
    >
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
  display,
  children,
}: {
  user: ShellData["user"];
  flash: ShellData["flash"];
  display: ShellData["display"];
  children: React.ReactNode;
}) {
  // Before the page below renders: the browser formats in the person's locale and
  // time zone, as the server did (app/lib/format.ts), so hydration matches.
  if (typeof document !== "undefined") setBrowserDisplaySettings(display);
  const items = navigationItems.filter((item) =>
    showsNavigationItem(item, user),
  );
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-graphite-800 bg-graphite-900 text-graphite-50 print:hidden">
        <MainMenu user={user} items={items} />
      </header>
      <main className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 sm:px-6 sm:py-8">
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
