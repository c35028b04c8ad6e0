/** One stored photo or signature, as GET/POST /api/visits/:visitId/attachments answer it. */
export interface AttachmentDto {
  id: string;
  visitId: number;
  kind: 'photo' | 'signature';
  stepId: string | null;
  caption: string | null;
  mimeType: 'image/jpeg' | 'image/png' | 'image/webp';
  bytes: number;
  width: number | null;
  height: number | null;
  url: string;
  thumbUrl: string | null;
  createdBy: number;
  createdAt: string;
}
