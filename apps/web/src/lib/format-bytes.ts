const units = ['bytes', 'KB', 'MB', 'GB'] as const;

/** "18.4 KB", "2.1 MB", "512 bytes" (1 KB = 1024 bytes). */
export function formatBytes(size: number): string {
  let value = size;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  if (unit === 0) return size === 1 ? '1 byte' : `${size} bytes`;
  return `${value.toFixed(value < 10 ? 1 : 0)} ${units[unit]}`;
}
