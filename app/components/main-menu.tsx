/**
 * The app shell's header: Turnledger's name, the person and sign-out, and the
 * main menu. From the md breakpoint (768 px) up everything shows in two rows;
 * below it the person and the menu fold behind one "Menu" button (a disclosure:
 * aria-expanded, aria-controls), which Escape closes and which closes by itself
 * once a link or form takes the person elsewhere.
 *
 * The server and the browser render the same markup: the menu starts closed
 * and only a press of the button opens it. Which of the two layouts shows is
 * left to CSS (the panel is `display: contents` from md up, so its parts sit in
 * the header's grid as before).
 */
import { useEffect, useId, useRef, useState } from "react";
import { Form, NavLink, useLocation } from "react-router";
import type { NavigationItem } from "~/lib/navigation";
import { roleLabels, type Role } from "~/lib/roles";

export function MainMenu({
  user,
  items,
}: {
  user: { name: string; roles: readonly Role[] };
  items: readonly NavigationItem[];
}) {
  const panelId = useId();
  const button = useRef<HTMLButtonElement>(null);
  const location = useLocation();
  // Open only on the page where it was opened: a navigation (new location key) closes it.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === location.key;

  useEffect(() => {
    if (!open) return;
    const closeOnEscape = (event: KeyboardEvent) => {
      if (event.key !== "Escape") return;
      setOpenOn(null);
      button.current?.focus();
    };
    document.addEventListener("keydown", closeOnEscape);
    return () => document.removeEventListener("keydown", closeOnEscape);
  }, [open]);

  return (
    <div className="mx-auto grid max-w-7xl grid-cols-[1fr_auto] items-center gap-x-8 gap-y-2 px-4 py-2 sm:px-6 md:pt-3 md:pb-2">
      <a
        href="/"
        className="flex min-h-11 items-center gap-2 self-center text-lg font-semibold tracking-tight md:min-h-0"
      >
        <img src="/favicon.svg" alt="" className="h-7 w-7" />
        Turnledger
      </a>
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpenOn(open ? null : location.key)}
        className="inline-flex min-h-11 min-w-11 items-center gap-2 rounded-md border border-graphite-500 px-3 font-medium text-graphite-50 hover:border-copper-300 md:hidden"
      >
        <MenuIcon open={open} />
        Menu
      </button>
      <div
        id={panelId}
        className={`col-span-2 pb-2 md:contents ${open ? "block" : "hidden"}`}
      >
        <div className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 border-b border-graphite-700 pb-2 text-sm md:col-start-2 md:row-start-1 md:justify-start md:border-0 md:pb-0">
          <NavLink
            to="/account"
            className="flex min-h-11 items-center hover:underline md:block md:min-h-0"
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
              className="min-h-11 rounded-md border border-graphite-500 px-3 py-1 text-graphite-100 hover:border-copper-300 md:min-h-0"
            >
              Sign out
            </button>
          </Form>
        </div>
        <nav aria-label="Main" className="pt-2 md:col-span-2 md:-mx-2 md:pt-0">
          <ul className="flex flex-col gap-0.5 md:flex-row md:flex-wrap">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.exact}
                  className={({ isActive }) =>
                    `flex min-h-11 items-center rounded-md px-2.5 py-1.5 text-base font-medium md:block md:min-h-0 md:text-sm ${
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
      </div>
    </div>
  );
}

/** Three bars, or a cross while the menu is open. */
function MenuIcon({ open }: { open: boolean }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 20 20"
      className="h-5 w-5"
      fill="none"
      stroke="currentColor"
      strokeWidth="2"
      strokeLinecap="round"
    >
      {open ? (
        <path d="M5 5l10 10M15 5L5 15" />
      ) : (
        <path d="M3 5h14M3 10h14M3 15h14" />
      )}
    </svg>
  );
}
