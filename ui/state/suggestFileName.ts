/**
 * A file name to offer when saving: the current name when it already has the extension,
 * else one made from the title ("Amide coupling" -> "amide-coupling.passline").
 */
export function suggestFileName(current: string, title: string, extension: string): string {
  if (current.toLowerCase().endsWith(extension)) return current;
  const stem = (current.replace(/\.[^.]*$/, '') || title)
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .replace(/\s+/g, '-')
    .toLowerCase()
    .slice(0, 80);
  return `${stem || 'untitled'}${extension}`;
}
