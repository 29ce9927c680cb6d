/** A file kept with a mechanism, without its bytes (`GET /api/mechanisms/:slug/attachments`, and the upload's answer). */
export interface AttachmentMeta {
  id: number;
  mechanismId: number;
  filename: string;
  mediaType: string;
  size: number;
  sha256: string;
  uploadedBy: number;
  createdAt: Date;
}
