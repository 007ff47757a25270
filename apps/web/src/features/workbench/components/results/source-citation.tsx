import { Link } from '@radix-ui/themes';
import { references } from '@skyledger/calc';

/** `Kopp2011` as readers write it: `Kopp 2011`. */
export function sourceLabel(key: string): string {
  return key.replace(/(\D)(\d{4})$/, '$1 $2');
}

/** Where a bibliography entry can be read: its DOI, else its web address. */
export function sourceHref(key: string): string | undefined {
  const reference = references.find((entry) => entry.key === key);
  if (reference?.doi) return `https://doi.org/${reference.doi}`;
  return reference?.url;
}

/** A source key as a short citation, linked where it can be read, with the full one on hover. */
export function SourceCitation({ sourceKey }: { sourceKey: string }) {
  const reference = references.find((entry) => entry.key === sourceKey);
  const href = sourceHref(sourceKey);
  const label = sourceLabel(sourceKey);
  return href ? (
    <Link href={href} target="_blank" rel="noreferrer" title={reference?.citation} highContrast>
      {label}
    </Link>
  ) : (
    <span title={reference?.citation}>{label}</span>
  );
}
