/**
 * A drawing (a chart, a legend's sample) that the server has drawn is kept as the
 * server drew it while the page hydrates: React neither renders it again nor walks
 * its SVG, and the drawing's code (visx, d3; loaded with lazyFigure) is not fetched
 * at all on the first load. A page with a handful of charts hydrates a few hundred
 * SVG nodes fewer in its first long task (issue 23: insight's total blocking time).
 *
 * Only for drawings that are pictures: no handlers, no state, nothing to focus. Their
 * text (aria-label, the summary, the <title>s) is in the server's markup and stays.
 * As soon as the props differ from those the server drew with (a what-if, a
 * navigation in the browser), the drawing is rendered by React as usual. A render in
 * the browser that is not hydration (arriving by a link) draws it as usual too.
 */
import { useState, useSyncExternalStore, type ComponentType } from "react";

/** How the drawing sits: "block" (a figure across the width) or "inline" (a sample in a line). */
export type DrawingFlow = "block" | "inline";

const neverChanges = () => () => {};
/** An empty innerHTML, the same object every render, so React never writes it. */
const keepChildren = { __html: "" };

/**
 * True in the render that hydrates the server's markup (React reads the server
 * snapshot then), false in every other render in the browser.
 */
function useHydrating(): boolean {
  return useSyncExternalStore(
    neverChanges,
    () => false,
    () => true,
  );
}

/** The same drawing: the props are equal value by value (they are plain data). */
export function sameDrawingProps(a: object, b: object): boolean {
  const left = a as Record<string, unknown>;
  const right = b as Record<string, unknown>;
  const keys = Object.keys(left);
  if (keys.length !== Object.keys(right).length) return false;
  return keys.every((key) => {
    const before = left[key];
    const after = right[key];
    if (Object.is(before, after)) return true;
    if (typeof before === "function" || typeof after === "function")
      return false;
    return JSON.stringify(before) === JSON.stringify(after);
  });
}

export function keepServerDrawing<Props extends object>(
  Drawing: ComponentType<Props>,
  flow: DrawingFlow,
): ComponentType<Props> {
  function ServerDrawing(props: Props) {
    const hydrating = useHydrating();
    // The props the server drew with, when this drawing came with the page.
    const [drawnWith] = useState<Props | null>(() =>
      hydrating && typeof document !== "undefined" ? props : null,
    );
    const kept = drawnWith !== null && sameDrawingProps(drawnWith, props);
    // A block wrapper takes the drawing's place in the flow (margins from a parent's
    // space-y apply to it); an inline one is display: contents, so a flex line's gap
    // and alignment see the drawing itself.
    const Wrapper = flow === "block" ? "div" : "span";
    const style = flow === "inline" ? { display: "contents" } : undefined;
    return kept ? (
      // React keeps the children it finds under an element with innerHTML and does
      // not compare them (suppressHydrationWarning); nothing is written into it.
      <Wrapper
        key="server"
        style={style}
        suppressHydrationWarning
        dangerouslySetInnerHTML={keepChildren}
      />
    ) : (
      <Wrapper key="browser" style={style}>
        <Drawing {...props} />
      </Wrapper>
    );
  }
  return ServerDrawing;
}
