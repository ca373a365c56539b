// Names of the files Fieldshed hands out, in its own plain words: the farm, the season and what
// the file holds, e.g. "alder-run-farm-2027-fields.csv".

/** Lower case ASCII words joined by hyphens; "farm" when nothing is left. */
export function fileSlug(text: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/g, '');
  return slug || 'farm';
}

/** "<farm>-<season>-<what>.<ext>". */
export function exportFileName(farmName: string, season: string, what: string, ext: string): string {
  return `${fileSlug(farmName)}-${fileSlug(season)}-${what}.${ext}`;
}
