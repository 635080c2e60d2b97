/** Types of domain-layers.js (plain JavaScript, so that eslint.config.js can import it). */
import type { Linter } from "eslint";

export declare const domainLayers: string[][];
export declare const knownExceptions: {
  file: string;
  imports: string[];
  why: string;
}[];
export declare function domainLayerConfigs(): Linter.Config[];
