import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";

export default function ImageNotFound() {
  return (
    <EmptyState title="No such photograph">
      <p>This photograph is not in the archive, was removed, or belongs to a source you cannot see.</p>
      <p className="mt-2">
        <Link href="/sources">Browse the sources</Link>
      </p>
    </EmptyState>
  );
}
