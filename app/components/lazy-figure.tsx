/**
 * A drawing (a chart, a legend's sample) whose code, and the libraries it draws
 * with (visx, d3), loads with import() instead of with the page: the server still
 * renders it whole, and while a page hydrates React keeps that server-rendered
 * drawing in place until the chunk has come (a lazy component inside Suspense), so
 * the page neither waits for it nor moves. After a navigation in the browser the
 * placeholder holds the drawing's room until it arrives. Keeps the libraries out of
 * the page's first-load JavaScript (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
import { lazy, Suspense, type ComponentType, type CSSProperties } from "react";

/** The room a drawing takes: an aspect ratio across the full width, or a fixed size. */
export type FigureRoom =
  { aspectRatio: string } | { width: number; height: number };

export function lazyFigure<Props extends object>(
  load: () => Promise<ComponentType<Props>>,
  room: FigureRoom,
): ComponentType<Props> {
  const Drawing = lazy(async () => ({ default: await load() }));
  const style: CSSProperties =
    "aspectRatio" in room
      ? { aspectRatio: room.aspectRatio, width: "100%", display: "block" }
      : {
          width: room.width,
          height: room.height,
          display: "inline-block",
          flexShrink: 0,
        };
  function LazyFigure(props: Props) {
    return (
      <Suspense fallback={<span aria-hidden="true" style={style} />}>
        <Drawing {...props} />
      </Suspense>
    );
  }
  return LazyFigure;
}
