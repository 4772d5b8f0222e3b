/** Sends one piece as multipart form data with XMLHttpRequest, reporting upload progress (0–1). */
export interface UploadAnswer {
  status: number;
  body: { id?: string; title?: string; bars?: number; warnings?: number; error?: string; field?: string };
}

export function sendPiece(file: File, confirmed: boolean, onProgress: (fraction: number) => void): Promise<UploadAnswer> {
  return new Promise((resolve) => {
    const form = new FormData();
    form.append("file", file);
    if (confirmed) form.append("confirm", "yes");
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/pieces");
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      const body = (xhr.response ?? {}) as UploadAnswer["body"];
      resolve({ status: xhr.status, body: xhr.status >= 400 && !body.error ? { error: `The upload failed (HTTP ${xhr.status}).` } : body });
    };
    xhr.onerror = () => resolve({ status: 0, body: { error: "The connection dropped during the upload. Please try again." } });
    xhr.send(form);
  });
}
