/**
 * The design page's panels below the fold, whose code loads after the page (lazyPanel):
 * the proposals of wire from stock and the costs at the foot of the page. The server
 * renders them whole; React keeps that HTML until their code has come.
 */
import { lazyPanel } from "~/components/lazy-panel";
import type { DesignCostPanel as CostPanel } from "./cost-panel";
import type { WireSubstitutesPanel as SubstitutesPanel } from "./wire-substitutes-panel";

export const DesignCostPanel = lazyPanel<Parameters<typeof CostPanel>[0]>(
  () => import("./cost-panel").then((module) => module.DesignCostPanel),
  null,
);

export const WireSubstitutesPanel = lazyPanel<
  Parameters<typeof SubstitutesPanel>[0]
>(
  () =>
    import("./wire-substitutes-panel").then(
      (module) => module.WireSubstitutesPanel,
    ),
  null,
);
