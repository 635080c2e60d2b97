import type { TestProject } from "vitest/node";
import { startTestEnvironment } from "../../scripts/lib/test-environment";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailFakeUrl: string;
    databaseUrl: string;
    smtpUrl: string;
  }
}

/** Starts the test database, mail fake and app once for the integration and browser tests. */
export default async function setup(project: TestProject) {
  const environment = await startTestEnvironment();
  project.provide("baseUrl", environment.baseUrl);
  project.provide("mailFakeUrl", environment.mailFakeUrl);
  project.provide("databaseUrl", environment.databaseUrl);
  project.provide("smtpUrl", environment.smtpUrl);
  return () => environment.stop();
}
