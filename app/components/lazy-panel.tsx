/**
 * A part of a page whose code loads with import() instead of with the page: a panel
 * few people use at once (a draft's form, proposals below the fold), so it is not
 * first-load JavaScript (docs/decisions/051-precompressed-assets-and-page-weight.md).
 *
 * As with `lazyFigure`, the server renders the panel whole, and while the page
 * hydrates React keeps that server-rendered panel in place until its chunk has come
 * (a lazy component inside Suspense): its links and forms work meanwhile as without
 * JavaScript. After a navigation in the browser `Fallback` holds its place until the
 * chunk arrives. The panel's module is imported only with import() (a static import
 * for the server's render, as `DataTable` has, would put it back into the page's
 * chunk: the bundler places a module by its import statements, used or not).
 */
import { lazy, Suspense, type ComponentType } from "react";

export function lazyPanel<Props extends object>(
  load: () => Promise<ComponentType<Props>>,
  Fallback: ComponentType<Props> | null,
): ComponentType<Props> {
  const Panel = lazy(async () => ({ default: await load() }));
  function LazyPanel(props: Props) {
    return (
      <Suspense fallback={Fallback ? <Fallback {...props} /> : null}>
        <Panel {...props} />
      </Suspense>
    );
  }
  return LazyPanel;
}
