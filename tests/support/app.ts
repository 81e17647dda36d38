// Talks to the running test app over HTTP, as a browser would: a cookie jar, next-auth's CSRF dance,
// and the local mail fake's mailbox. The test command starts the app and exports TEST_APP_URL.
import { execFileSync } from "node:child_process";

export const APP = process.env.TEST_APP_URL ?? "http://localhost:3100";
export const MAILBOX = process.env.MAIL_FAKE_API_URL ?? "http://127.0.0.1:1090";
export const DEMO_PASSWORD = "cordarium-demo";
export const DEMO = {
  admin: "admin@cordarium.test",
  editor: "editor@cordarium.test",
  contributor: "contributor@cordarium.test",
  reader: "reader@cordarium.test",
} as const;

if (!/^https?:\/\/(localhost|127\.0\.0\.1)[:/]/.test(APP)) {
  throw new Error(`Refusing to run tests against a non-local app: ${APP}`);
}

export class Jar {
  private cookies = new Map<string, string>();
  store(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const i = pair.indexOf("=");
      const name = pair.slice(0, i).trim();
      const value = pair.slice(i + 1).trim();
      if (/max-age=0|expires=thu, 01 jan 1970/i.test(line) || value === "") this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }
  header(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }
  has(name: string) {
    return this.cookies.has(name);
  }
}

export async function call(path: string, init: { jar?: Jar; method?: string; json?: unknown; form?: Record<string, string>; headers?: Record<string, string> } = {}) {
  const headers: Record<string, string> = { ...(init.headers ?? {}) };
  if (init.jar) headers.cookie = init.jar.header();
  let body: string | undefined;
  if (init.json !== undefined) {
    headers["content-type"] = "application/json";
    body = JSON.stringify(init.json);
  } else if (init.form) {
    headers["content-type"] = "application/x-www-form-urlencoded";
    body = new URLSearchParams(init.form).toString();
  }
  const res = await fetch(new URL(path, APP), { method: init.method ?? (body ? "POST" : "GET"), headers, body, redirect: "manual" });
  init.jar?.store(res);
  return res;
}

async function csrf(jar: Jar): Promise<string> {
  const res = await call("/api/auth/csrf", { jar });
  return ((await res.json()) as { csrfToken: string }).csrfToken;
}

/** Signs in with e-mail and password; returns the jar, and the error next-auth gave if it refused. */
export async function signIn(email: string, password = DEMO_PASSWORD, fromAddress?: string): Promise<{ jar: Jar; error: string | null }> {
  const jar = new Jar();
  const token = await csrf(jar);
  // The app reads the client's address from X-Forwarded-For, as set by the proxy in front of it.
  const headers = fromAddress ? { "x-forwarded-for": fromAddress } : undefined;
  const res = await call("/api/auth/callback/credentials", { jar, headers, form: { csrfToken: token, email, password, json: "true" } });
  const { url } = (await res.json()) as { url: string };
  const error = new URL(url).searchParams.get("error");
  return { jar, error };
}

export async function signedIn(email: string, password = DEMO_PASSWORD): Promise<Jar> {
  const { jar, error } = await signIn(email, password);
  if (error) throw new Error(`sign-in as ${email} failed: ${error}`);
  return jar;
}

export async function requestSignInLink(email: string): Promise<Response> {
  const jar = new Jar();
  const token = await csrf(jar);
  return call("/api/auth/signin/email", { jar, form: { csrfToken: token, email, callbackUrl: `${APP}/`, json: "true" } });
}

export async function sessionOf(jar: Jar): Promise<{ user?: { id: number; email: string } }> {
  return (await call("/api/auth/session", { jar })).json();
}

export type Mail = { id: string; to: string[]; subject: string; text: string; links: string[]; receivedAt: string };

/** Waits for a message to `to` that arrived after `since` and whose subject matches. */
export async function waitForMail(to: string, subject: RegExp, since: Date, timeoutMs = 10_000): Promise<Mail> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const res = await fetch(`${MAILBOX}/messages?to=${encodeURIComponent(to)}`);
    const { messages } = (await res.json()) as { messages: Mail[] };
    const hit = messages.find((m) => subject.test(m.subject) && new Date(m.receivedAt) >= since);
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

export async function countMail(to: string): Promise<number> {
  const res = await fetch(`${MAILBOX}/messages?to=${encodeURIComponent(to)}`);
  return ((await res.json()) as { messages: Mail[] }).messages.length;
}

/** Starts or stops one service of the test profile, as an operator would. */
export function service(action: "start" | "stop", name: "s3" | "search" | "mail" | "database") {
  execFileSync("./docker-free-scripts/services", ["test", action, name], { stdio: "inherit" });
}

export const unique = (prefix: string) => `${prefix}-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

/** Makes a new account the way a real one is made: an admin invites, the invitee accepts from the e-mail. */
export async function invitedUser(role: "reader" | "contributor" | "editor" | "admin", admin?: Jar) {
  const adminJar = admin ?? (await signedIn(DEMO.admin));
  const email = `${unique(role)}@example.test`;
  const since = new Date(Date.now() - 50);
  const res = await call("/api/admin/invitations", { jar: adminJar, json: { email, role } });
  if (res.status !== 200) throw new Error(`invitation failed: ${res.status} ${await res.text()}`);
  const mail = await waitForMail(email, /invited/i, since);
  const link = mail.links.find((l) => l.includes("/invitation/"))!;
  const token = link.split("/invitation/")[1];
  const password = "correct horse battery";
  const name = `Test ${role} ${email.slice(0, 6)}`;
  const accepted = await call("/api/invitations/accept", { json: { token, name, password } });
  if (accepted.status !== 200) throw new Error(`accept failed: ${accepted.status} ${await accepted.text()}`);
  const { account } = (await accepted.json()) as { account: { id: number } };
  return { id: account.id, email, password, name, token };
}
