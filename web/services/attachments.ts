import type { AttachmentMeta } from '@api/attachments/attachments.schemas';
import { ApiError, csrfToken, errorFromResponse, http, NETWORK_ERROR, reportSessionProblem } from './http';
import type { Jsonified } from './jsonified';

/** A file kept with a mechanism (`GET /api/mechanisms/:slug/attachments`): the server's type with dates as strings. */
export type Attachment = Jsonified<AttachmentMeta>;

const attachmentsPath = (slug: string) => `/api/mechanisms/${encodeURIComponent(slug)}/attachments`;

export const listAttachments = (slug: string) => http.get<Attachment[]>(attachmentsPath(slug));

/** Where the browser downloads the file (served as the type its bytes show, as a download). */
export const attachmentDownloadUrl = (id: number) => `/api/attachments/${id}/content`;

/** Uploaded bytes over total bytes, 0…1. */
export type UploadProgress = (fraction: number) => void;

/**
 * Uploads one file as multipart field `file`. XMLHttpRequest rather than fetch, because only it
 * reports upload progress; it still sends the CSRF header and fails with an ApiError like every
 * other call (413 for a file over the limit, 400 for an empty one).
 */
export function uploadAttachment(slug: string, file: File, onProgress: UploadProgress = () => {}): Promise<Attachment> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', attachmentsPath(slug));
    xhr.setRequestHeader('X-CSRF-Token', csrfToken());
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.withCredentials = true;
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      const body = parseJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve(body as Attachment);
        return;
      }
      const error = errorFromResponse(xhr.status, xhr.statusText, body);
      reportSessionProblem(error);
      reject(error);
    };
    xhr.onerror = () => reject(new ApiError(0, NETWORK_ERROR, 'The upload could not reach the Cyclewright server. Check your connection and try again.'));
    const form = new FormData();
    form.append('file', file, file.name);
    xhr.send(form);
  });
}

function parseJson(text: string): unknown {
  try {
    return text === '' ? null : JSON.parse(text);
  } catch {
    return null;
  }
}
