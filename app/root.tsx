import { Links, Meta, Outlet, Scripts, ScrollRestoration } from "react-router";
import { RouteErrorPage } from "./components/route-error";
import type { Route } from "./+types/root";
import "./app.css";

export function Layout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <link rel="icon" href="/favicon.svg" type="image/svg+xml" />
        <Meta />
        {/* Stylesheets need no nonce (style-src 'self'), and browsers hide a nonce
            from the page, so one here would not match the client's render. */}
        <Links nonce="" />
      </head>
      <body className="min-h-screen">
        {children}
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

/** Errors outside the app shell, and errors of the shell itself (app/routes/app-shell.tsx shows the rest). */
export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
