// Runs the mail fake on its own: MAIL_FAKE_SMTP_PORT, MAIL_FAKE_API_PORT, MAIL_FAKE_DIR.
import { startMailFake } from "./server";

const fake = await startMailFake({
  host: process.env.MAIL_FAKE_HOST ?? "127.0.0.1",
  smtpPort: Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525),
  apiPort: Number(process.env.MAIL_FAKE_API_PORT ?? 1080),
  dataDir: process.env.MAIL_FAKE_DIR ?? ".data/mail",
});
console.log(`mail fake: SMTP on port ${fake.smtpPort}, mailbox at ${fake.apiUrl}/messages`);

const stop = () => void fake.close().then(() => process.exit(0));
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
