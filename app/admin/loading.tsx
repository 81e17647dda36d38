export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="py-12 text-center text-ink-soft">
      Fetching the records…
    </div>
  );
}
