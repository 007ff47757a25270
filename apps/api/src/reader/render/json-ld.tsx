/**
 * Structured data as the text of a script element: JSON with every `<` written as
 * `\u003c`, so no string in it can close the element (`</script>`) or open a comment.
 */
export function jsonLdText(data: unknown): string {
  return JSON.stringify(data).replace(/</g, '\\u003c');
}

/** One `<script type="application/ld+json">`: data for search engines, never run. */
export function JsonLdScript({ data }: { data: unknown }) {
  return (
    <script type="application/ld+json" dangerouslySetInnerHTML={{ __html: jsonLdText(data) }} />
  );
}
