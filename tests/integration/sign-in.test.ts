// Sign-in by password and by e-mail link, password reset, disabled accounts and throttling, through
// the running app and the mail fake, as a browser would drive next-auth.
import { describe, expect, it } from "vitest";
import { call, DEMO, invitedUser, requestSignInLink, sessionOf, signedIn, signIn, unique, waitForMail, countMail, Jar } from "../support/app";

describe("sign-in by password", () => {
  it.each(Object.entries(DEMO))("the demo %s signs in with the demo password", async (_role, email) => {
    const jar = await signedIn(email);
    const session = await sessionOf(jar);
    expect(session.user?.email).toBe(email);
  });

  it("a wrong password is refused with a plain message and no session", async () => {
    const { jar, error } = await signIn(DEMO.editor, "not the password");
    expect(error).toMatch(/do not match an account/);
    expect(await sessionOf(jar)).toEqual({});
  });

  it("sign-out ends the session", async () => {
    const jar = await signedIn(DEMO.reader);
    const { csrfToken } = (await (await call("/api/auth/csrf", { jar })).json()) as { csrfToken: string };
    await call("/api/auth/signout", { jar, form: { csrfToken, json: "true" } });
    expect(await sessionOf(jar)).toEqual({});
  });
});

describe("sign-in by e-mail link", () => {
  it("sends a link that signs in once; a reused link is refused", async () => {
    const since = new Date(Date.now() - 50);
    const res = await requestSignInLink(DEMO.contributor);
    expect(res.status).toBe(200);
    const mail = await waitForMail(DEMO.contributor, /sign-in link/i, since);
    const link = mail.links.find((l) => l.includes("/api/auth/callback/email"))!;
    expect(link).toBeTruthy();

    const jar = new Jar();
    const first = await call(link, { jar });
    expect(first.status).toBe(302);
    expect((await sessionOf(jar)).user?.email).toBe(DEMO.contributor);

    const again = new Jar();
    const second = await call(link, { jar: again });
    expect(second.headers.get("location")).toMatch(/error=Verification/);
    expect(await sessionOf(again)).toEqual({});
  });

  it("sends nothing to an address without an account, and says the same", async () => {
    const email = `${unique("stranger")}@example.test`;
    const res = await requestSignInLink(email);
    expect(res.status).toBe(200);
    await new Promise((r) => setTimeout(r, 500));
    expect(await countMail(email)).toBe(0);
  });
});

describe("password reset", () => {
  it("a reset link sets a new password once, and the old one stops working", async () => {
    const user = await invitedUser("reader");
    const since = new Date(Date.now() - 50);
    expect((await call("/api/account/password-reset", { json: { email: user.email } })).status).toBe(200);
    const mail = await waitForMail(user.email, /reset/i, since);
    const token = mail.links.find((l) => l.includes("/reset-password/"))!.split("/reset-password/")[1];

    const weak = await call("/api/account/password", { json: { token, password: "short" } });
    expect(weak.status).toBe(400);
    expect(await weak.json()).toMatchObject({ error: { code: "invalid_input", fields: { password: ["Use at least 10 characters."] } } });

    expect((await call("/api/account/password", { json: { token, password: "a brand new passphrase" } })).status).toBe(200);
    expect((await signIn(user.email, user.password)).error).toMatch(/do not match/);
    expect((await signIn(user.email, "a brand new passphrase")).error).toBeNull();

    const reused = await call("/api/account/password", { json: { token, password: "yet another passphrase" } });
    expect(reused.status).toBe(400);
    expect((await signIn(user.email, "a brand new passphrase")).error).toBeNull();
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const email = `${unique("nobody")}@example.test`;
    const res = await call("/api/account/password-reset", { json: { email } });
    expect(res.status).toBe(200);
    await new Promise((r) => setTimeout(r, 300));
    expect(await countMail(email)).toBe(0);
  });

  it("refuses malformed input with a clear message", async () => {
    const res = await call("/api/account/password-reset", { json: { email: "not an address" } });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ error: { fields: { email: ["Enter a valid e-mail address."] } } });
    const broken = await call("/api/account/password-reset", { method: "POST", headers: { "content-type": "application/json" } });
    expect(broken.status).toBe(400);
  });
});

// Each case signs in from its own documentation address (RFC 5737) so that cases do not share a count.
const address = () => `198.51.100.${Math.floor(Math.random() * 250) + 1}`;

describe("throttling failed sign-ins", () => {
  it("after five failures the account waits, even with the right password and from elsewhere", async () => {
    const user = await invitedUser("reader");
    const from = address();
    for (let i = 0; i < 5; i++) expect((await signIn(user.email, "wrong password", from)).error).toMatch(/do not match/);
    expect((await signIn(user.email, user.password, from)).error).toMatch(/Too many failed sign-ins/);
    expect((await signIn(user.email, user.password, "203.0.113.77")).error).toMatch(/Too many failed sign-ins/);
  });

  it("a success clears the account's count of failures", async () => {
    const user = await invitedUser("reader");
    const from = address();
    for (let i = 0; i < 4; i++) await signIn(user.email, "wrong password", from);
    expect((await signIn(user.email, user.password, from)).error).toBeNull();
    for (let i = 0; i < 4; i++) await signIn(user.email, "wrong password", from);
    expect((await signIn(user.email, user.password, from)).error).toBeNull();
  });

  it("one address failing on many accounts is slowed down too", async () => {
    const from = `203.0.113.${Math.floor(Math.random() * 200) + 1}`;
    // SIGN_IN_MAX_FAILURES_PER_ADDRESS defaults to 30, each on a different account.
    for (let i = 0; i < 30; i++) await signIn(`${unique("guess")}@example.test`, "wrong password", from);
    expect((await signIn(DEMO.reader, undefined, from)).error).toMatch(/Too many failed sign-ins/);
    expect((await signIn(DEMO.reader)).error).toBeNull();
  });
});
