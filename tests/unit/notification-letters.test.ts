// The daily digest's hour and the letters that carry notifications.
import { describe, expect, it } from "vitest";
import { DIGEST_HOUR_UTC, nextDigestAt } from "@/lib/notifications/digest-time";
import { digestLetter, noticeLetter } from "@/lib/notifications/letters";

describe("nextDigestAt", () => {
  it("runs at 06:00 UTC", () => {
    expect(DIGEST_HOUR_UTC).toBe(6);
  });

  it("is today at 06:00 before that hour, and tomorrow from 06:00 on", () => {
    expect(nextDigestAt(new Date("2026-03-10T05:59:59.999Z")).toISOString()).toBe("2026-03-10T06:00:00.000Z");
    expect(nextDigestAt(new Date("2026-03-10T06:00:00.000Z")).toISOString()).toBe("2026-03-11T06:00:00.000Z");
    expect(nextDigestAt(new Date("2026-03-10T23:30:00.000Z")).toISOString()).toBe("2026-03-11T06:00:00.000Z");
  });

  it("rolls over the end of a month and of a year (UTC has no daylight saving)", () => {
    expect(nextDigestAt(new Date("2026-02-28T12:00:00Z")).toISOString()).toBe("2026-03-01T06:00:00.000Z");
    expect(nextDigestAt(new Date("2026-12-31T07:00:00Z")).toISOString()).toBe("2027-01-01T06:00:00.000Z");
    // The clocks in Europe go forward on 29 March 2026: the digest stays at 06:00 UTC.
    expect(nextDigestAt(new Date("2026-03-29T01:30:00Z")).toISOString()).toBe("2026-03-29T06:00:00.000Z");
  });
});

const base = "https://archive.example";
const notice = (subject: string, body: string, at: string) => ({ subject, body, link: null, createdAt: new Date(at) });

describe("notification letters", () => {
  it("sends one notice under its own subject, with where to change the choice", () => {
    const letter = noticeLetter("a@example.test", notice("A region on “The lute player” awaits review", "Anna proposed a region.", "2026-03-10T10:00:00Z"), base);
    expect(letter).toMatchObject({ to: "a@example.test", subject: "A region on “The lute player” awaits review" });
    expect(letter.text).toContain("Anna proposed a region.");
    expect(letter.text).toContain(`${base}/account`);
  });

  it("gathers every notice of the day, oldest first, numbered, under a subject that counts them", () => {
    const letter = digestLetter(
      "b@example.test",
      [notice("First", "one", "2026-03-10T08:05:00Z"), notice("Second", "two", "2026-03-10T17:45:00Z")],
      base,
    );
    expect(letter.subject).toBe("Cordarium digest: 2 notices");
    expect(letter.text.indexOf("1. First (2026-03-10 08:05 UTC)")).toBeGreaterThan(0);
    expect(letter.text.indexOf("2. Second (2026-03-10 17:45 UTC)")).toBeGreaterThan(letter.text.indexOf("one"));
    expect(digestLetter("b@example.test", [notice("Only", "x", "2026-03-10T08:05:00Z")], base).subject).toBe("Cordarium digest: 1 notice");
  });
});
