"use client";

import { Button } from "@/components/ui/button";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="mx-auto max-w-prose py-12 text-center">
      <h1 className="text-3xl">Something went wrong</h1>
      <p className="mt-3 text-ink-soft">
        The page could not be shown. Nothing you saved was lost. Try again; if it keeps happening, tell the archive&apos;s administrator
        {error.digest ? (
          <>
            {" "}and quote <span className="font-mono">{error.digest}</span>
          </>
        ) : null}
        .
      </p>
      <Button className="mt-6" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
