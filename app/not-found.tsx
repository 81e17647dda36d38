import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-prose py-12 text-center">
      <p className="font-mono text-sm text-ink-faint">404</p>
      <h1 className="mt-2 text-3xl">Not in the archive</h1>
      <p className="mt-3 text-ink-soft">There is no page at this address. It may have moved, or the link may be mistyped.</p>
      <Link href="/" className="mt-6 inline-block font-semibold">
        Back to the archive
      </Link>
    </div>
  );
}
