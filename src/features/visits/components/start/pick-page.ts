/** A pick list shows the first few matches; typing more narrows it. */
export const PICK_PAGE = { page: 1, pageSize: 8 } as const;
