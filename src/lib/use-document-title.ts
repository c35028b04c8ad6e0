import { useEffect } from 'react';

export const PRODUCT_NAME = 'Crankwise';

export function useDocumentTitle(title: string): void {
  useEffect(() => {
    document.title = `${title} · ${PRODUCT_NAME}`;
  }, [title]);
}
