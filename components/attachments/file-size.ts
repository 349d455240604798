/** A file's size for people: bytes, kB or MB (1024-based, as the 10 MB cap is). */
export function formatFileSize(sizeBytes: number): string {
  if (sizeBytes < 1024) return `${sizeBytes} B`;
  const kB = sizeBytes / 1024;
  if (kB < 1024) return `${kB < 10 ? kB.toFixed(1) : Math.round(kB)} kB`;
  const MB = kB / 1024;
  return `${MB < 10 ? MB.toFixed(1) : Math.round(MB)} MB`;
}
