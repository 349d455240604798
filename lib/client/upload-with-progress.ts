// fetch() reports no upload progress; XMLHttpRequest does (its `upload` events). This is the one
// place the UI uses it: a POST of a form whose answer is read as text, with progress as it goes.

export interface UploadProgress {
  loadedBytes: number;
  totalBytes: number;
}

export interface UploadAnswer {
  status: number;
  text: string;
}

/** Thrown when the request never got an answer (network down, connection reset) or was aborted. */
export class UploadInterrupted extends Error {
  constructor(readonly aborted: boolean) {
    super(aborted ? "The upload was cancelled." : "The upload did not reach the server; check the connection and try again.");
  }
}

export function postWithUploadProgress(
  url: string,
  body: FormData,
  { onProgress, signal }: { onProgress?: (progress: UploadProgress) => void; signal?: AbortSignal } = {},
): Promise<UploadAnswer> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "text";
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress?.({ loadedBytes: event.loaded, totalBytes: event.total });
    };
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () => reject(new UploadInterrupted(false));
    xhr.onabort = () => reject(new UploadInterrupted(true));
    signal?.addEventListener("abort", () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}
