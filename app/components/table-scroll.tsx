/**
 * The box every wide table sits in: on a narrow screen the table scrolls
 * sideways inside it (never the whole page), with its first column pinned (the
 * `.data-table` rules in app.css). While the table is wider than the box, the box
 * is a named region in the Tab order with a focus ring, so a keyboard user can
 * reach it and scroll it with the arrow keys (axe: scrollable-region-focusable).
 */
import { useEffect, useRef, useState } from "react";

export function TableScroll({
  label,
  className = "",
  widerThanPanel = false,
  children,
}: {
  /** The region's name, said by screen readers: usually the table's caption. */
  label: string;
  className?: string;
  /** Known to be wider than its box (many columns): reachable by keyboard from the first paint, before any measurement. */
  widerThanPanel?: boolean;
  children: React.ReactNode;
}) {
  const box = useRef<HTMLDivElement>(null);
  const scrolls = useScrollsSideways(box);
  return (
    <div
      ref={box}
      className={`table-scroll ${className}`}
      {...(scrolls || widerThanPanel
        ? { tabIndex: 0, role: "region", "aria-label": label }
        : {})}
    >
      {children}
    </div>
  );
}

/** Whether the element is wider inside than it shows (it scrolls sideways), kept up to date as it or its content resizes. */
function useScrollsSideways(ref: React.RefObject<HTMLElement | null>) {
  const [scrolls, setScrolls] = useState(false);
  useEffect(() => {
    const element = ref.current;
    if (!element) return;
    const check = () => setScrolls(element.scrollWidth > element.clientWidth);
    check();
    const observer = new ResizeObserver(check);
    observer.observe(element);
    if (element.firstElementChild) observer.observe(element.firstElementChild);
    return () => observer.disconnect();
  }, [ref]);
  return scrolls;
}
