"use client";

// The images section of a source page: the ready photographs, the ones still on their way, and the
// uploader. The list is polled while the server is still working on any image, and only then.
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { api, ApiError } from "@/lib/client/api";
import { ImageCard } from "./image-thumbnails";
import { FailureNote, NearDuplicateNote } from "./image-details";
import { imageName, SERVER_STATE_TEXT, type SourceImage, UNFINISHED } from "./image-types";
import { ImageUploader } from "./image-uploader";

type Props = { sourceId: number; canUpload: boolean; canReprocess: boolean; initialImages: SourceImage[] };

// Processing a photograph takes a second or two here: often enough to feel live, rarely enough to be cheap.
const POLL_MS = 1500;

export function SourceImagesPanel({ sourceId, canUpload, canReprocess, initialImages }: Props) {
  const client = useQueryClient();
  const queryKey = ["source-images", sourceId];
  const [tracked, setTracked] = useState<number[]>([]);
  const query = useQuery({
    queryKey,
    queryFn: () => api<{ images: SourceImage[] }>(`/api/sources/${sourceId}/images`),
    initialData: { images: initialImages },
    // The first paint is the server's; ask the API at once for what it adds (and what changed).
    initialDataUpdatedAt: 0,
    refetchInterval: (q) => (q.state.data?.images.some((i) => UNFINISHED.includes(i.state)) ? POLL_MS : false),
  });
  const images = query.data.images;
  const refresh = useCallback(() => void client.invalidateQueries({ queryKey: ["source-images", sourceId] }), [client, sourceId]);

  const reprocess = useMutation({
    mutationFn: (imageId: number) => api(`/api/images/${imageId}/reprocess`, { method: "POST", body: {} }),
    onSettled: refresh,
  });
  const discard = useMutation({
    mutationFn: (imageId: number) => api(`/api/images/${imageId}/upload`, { method: "DELETE" }),
    onSettled: refresh,
  });
  // A refusal is shown under the image it concerns.
  const refusal = (imageId: number) => {
    const failed = [reprocess, discard].find((m) => m.isError && m.variables === imageId);
    if (!failed) return null;
    return failed.error instanceof ApiError ? failed.error.message : "The server could not be reached.";
  };

  const ready = images.filter((i) => i.state === "ready");
  const pending = images.filter((i) => i.state !== "ready" && !tracked.includes(i.id));

  return (
    <section aria-labelledby="images-heading" className="mb-8">
      <h2 id="images-heading" className="mb-3 text-2xl">
        Photographs
      </h2>
      {ready.length === 0 && pending.length === 0 && tracked.length === 0 && (
        <EmptyState title="No photographs yet">
          {canUpload ? "Add the first ones below: a view of the whole work, then details of the instrument." : "Photographs of this work appear here once a cataloguer adds them."}
        </EmptyState>
      )}
      {ready.length > 0 && (
        <ul aria-label="Ready photographs" className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-4">
          {ready.map((image) => (
            <ImageCard key={image.id} image={image} />
          ))}
        </ul>
      )}
      {pending.length > 0 && (
        <div className="mt-6">
          <h3 className="mb-2 text-lg">Not yet visible to readers</h3>
          <ul aria-label="Photographs not yet visible to readers" className="divide-y divide-rule rounded border border-rule bg-card">
            {pending.map((image) => (
              <li key={image.id} className="flex flex-wrap items-start justify-between gap-3 px-4 py-3">
                <div className="min-w-0">
                  <p className="font-semibold">{imageName(image)}</p>
                  <p className="text-sm text-ink-soft">
                    <span className="font-mono text-xs">image {image.id}</span> · {SERVER_STATE_TEXT[image.state]}
                  </p>
                  {image.state === "failed" && <FailureNote reason={image.failureReason} />}
                  <NearDuplicateNote image={image} />
                  {refusal(image.id) && (
                    <p role="alert" className="mt-1 text-sm text-warn">
                      {refusal(image.id)}
                    </p>
                  )}
                </div>
                {image.state === "failed" && canReprocess && (
                  <Button type="button" variant="quiet" disabled={reprocess.isPending} onClick={() => reprocess.mutate(image.id)} aria-label={`Run processing again for image ${image.id}`}>
                    Run processing again
                  </Button>
                )}
                {image.state === "uploading" && canUpload && (
                  <Button type="button" variant="danger" disabled={discard.isPending} onClick={() => discard.mutate(image.id)} aria-label={`Discard the unfinished upload of image ${image.id}`}>
                    Discard
                  </Button>
                )}
              </li>
            ))}
          </ul>
        </div>
      )}
      {query.error && !query.isFetching && (
        <p role="alert" className="mt-2 text-sm text-warn">
          The list of photographs could not be refreshed: {query.error.message}
        </p>
      )}
      {canUpload && (
        <div className="mt-6">
          <ImageUploader sourceId={sourceId} images={images} onAccepted={refresh} onTracked={setTracked} />
        </div>
      )}
    </section>
  );
}
