import { useCallback } from 'react';

/**
 * Shows bytes fetched with the token through an object URL, made when the element mounts
 * and revoked when it goes (a React 19 ref cleanup), so no URL outlives its element.
 */
function useObjectUrlRef<E extends HTMLImageElement | HTMLIFrameElement>(blob: Blob) {
  return useCallback(
    (element: E | null) => {
      if (!element) return;
      const url = URL.createObjectURL(blob);
      element.src = url;
      return () => URL.revokeObjectURL(url);
    },
    [blob],
  );
}

export function BlobImage({ blob, alt }: { blob: Blob; alt: string }) {
  return (
    <img ref={useObjectUrlRef<HTMLImageElement>(blob)} alt={alt} className="sl-preview-image" />
  );
}

export function BlobFrame({ blob, title }: { blob: Blob; title: string }) {
  return (
    <iframe
      ref={useObjectUrlRef<HTMLIFrameElement>(blob)}
      title={title}
      className="sl-preview-frame"
    />
  );
}
