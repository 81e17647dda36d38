// Sends a file's bytes straight to object storage through the presigned URLs the API handed out.
// XMLHttpRequest rather than fetch: only it reports upload progress (upload.onprogress) today.

export type UploadTarget =
  | { kind: "single"; url: string; headers: Record<string, string> }
  | { kind: "multipart"; partSize: number; parts: { partNumber: number; url: string }[] };

export type StartedUpload = { image: { id: number }; upload: UploadTarget };
export type UploadedPart = { partNumber: number; etag: string };

/** The storage refused or the connection broke: worth trying again, unlike a refusal by the API. */
export class TransferError extends Error {}
export class TransferAborted extends Error {
  constructor() {
    super("The upload was cancelled.");
  }
}

function put(url: string, body: Blob, headers: Record<string, string>, onProgress: (sent: number) => void, signal: AbortSignal): Promise<string | null> {
  return new Promise((resolve, reject) => {
    if (signal.aborted) return reject(new TransferAborted());
    const xhr = new XMLHttpRequest();
    const abort = () => xhr.abort();
    signal.addEventListener("abort", abort, { once: true });
    const settle = () => signal.removeEventListener("abort", abort);
    xhr.open("PUT", url);
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.upload.onprogress = (e) => onProgress(e.loaded);
    xhr.onload = () => {
      settle();
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(body.size);
        resolve(xhr.getResponseHeader("ETag"));
      } else {
        reject(new TransferError(`The storage refused the upload (HTTP ${xhr.status}); try again.`));
      }
    };
    xhr.onerror = () => {
      settle();
      reject(new TransferError("The connection to the storage broke; try again."));
    };
    xhr.ontimeout = xhr.onerror;
    xhr.onabort = () => {
      settle();
      reject(new TransferAborted());
    };
    xhr.send(body);
  });
}

/**
 * Uploads the file as the target says. `onProgress` gets the bytes sent so far over all parts.
 * Parts go one after another: two files upload at once already, and a part that fails is the
 * only one lost. Returns the parts' ETags for a multipart upload, else undefined.
 */
export async function sendFile(file: File, target: UploadTarget, onProgress: (sent: number) => void, signal: AbortSignal): Promise<UploadedPart[] | undefined> {
  if (target.kind === "single") {
    await put(target.url, file, target.headers, onProgress, signal);
    return undefined;
  }
  const done: UploadedPart[] = [];
  let before = 0;
  for (const { partNumber, url } of [...target.parts].sort((a, b) => a.partNumber - b.partNumber)) {
    const slice = file.slice((partNumber - 1) * target.partSize, partNumber * target.partSize);
    const etag = await put(url, slice, {}, (sent) => onProgress(before + sent), signal);
    if (!etag) throw new TransferError("The storage did not confirm a part of the upload (no ETag); try again.");
    done.push({ partNumber, etag });
    before += slice.size;
  }
  return done;
}
