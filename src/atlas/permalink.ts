/** Lowercase words joined by hyphens: the URL form of a family name ("Circles and conics" → "circles-and-conics"). */
export function slugify(text: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  if (slug.length === 0) throw new Error(`slugify: "${text}" has no letters or digits to make a slug from`);
  return slug;
}

/** Site-relative permanent path of a problem page, with the trailing slash the site is built with. */
export function problemPath(slug: string): string {
  if (!/^[a-z0-9]+(?:-[a-z0-9]+)*$/.test(slug)) throw new Error(`problemPath: "${slug}" is not a problem slug`);
  return `/problems/${slug}/`;
}

/** Site-relative path of a family's page. */
export function familyPath(family: string): string {
  return `/families/${slugify(family)}/`;
}

/** Absolute URL of a site-relative path on the given site origin (e.g. "https://atlas.enumerative.example"). */
export function absoluteUrl(path: string, site: string | URL): string {
  return new URL(path, site).href;
}

/** Site-relative path of a tag's page ("Bézout bound exact" → "/tags/bezout-bound-exact/"). */
export function tagPath(tag: string): string {
  return `/tags/${slugify(tag)}/`;
}
