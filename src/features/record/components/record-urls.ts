/** Where a rendering fetches the record's pictures: the office through its session, the customer through the signed link. */
export interface RecordPictureUrls {
  thumb: (attachmentId: string) => string;
  /** The full picture, opened in a new tab; the customer's page has thumbnails only. */
  full?: (attachmentId: string) => string;
  signature: (attachmentId: string) => string;
}
