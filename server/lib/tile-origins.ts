// The Content-Security-Policy sources for tile URL templates: the scheme and host of each, with a
// {s} subdomain placeholder widened to a wildcard (Leaflet spreads tiles over a., b., c., …).
const SUBDOMAIN = 'fieldshed-subdomain-placeholder';

/** 'https://{s}.tile.example.org/{z}/{x}/{y}.png' → 'https://*.tile.example.org'; duplicates once. */
export function tileOrigins(templates: string[]): string[] {
  const origins = templates.map((t) => {
    const url = new URL(t.replace(/\{s\}/g, SUBDOMAIN).replace(/\{[^}]*\}/g, '0'));
    return url.origin.replace(SUBDOMAIN, '*');
  });
  return [...new Set(origins)];
}
