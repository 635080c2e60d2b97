import { startMailFake } from "./lib/mail-fake";

const smtpPort = Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525);
const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 2526);
const fake = await startMailFake({ smtpPort, httpPort });
console.log(
  `[mail fake] SMTP on 127.0.0.1:${fake.smtpPort}; messages at http://127.0.0.1:${fake.httpPort}/messages`,
);
for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => void fake.close().then(() => process.exit(0)));
}
