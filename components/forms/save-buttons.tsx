import { Button } from "@/components/ui/button";

// The submit button is disabled while a save runs, so a second click cannot send the form twice;
// Cancel shows only where the form was opened in place and can be closed.
export function SaveButtons({ label, busy, onCancel, className }: { label: string; busy: boolean; onCancel?: () => void; className?: string }) {
  return (
    <div className={className}>
      <Button type="submit" disabled={busy}>
        {busy ? "Saving…" : label}
      </Button>
      {onCancel && (
        <Button type="button" variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      )}
    </div>
  );
}
