/**
 * The stylesheet of a standalone figure file from the texts of tokens.css and figure.css: the light palette and fonts
 * (the first :root block of tokens.css, set on the <svg>) followed by the figure rules, comments and runs of white
 * space removed. Throws when the tokens have no :root block.
 */
export function standaloneFigureCss(tokens: string, figure: string): string {
  const root = /:root\s*\{[^}]*\}/.exec(tokens)?.[0];
  if (!root) throw new Error('tokens.css: no :root block to take the figure colours from');
  const compact = (css: string) => css.replace(/\/\*[\s\S]*?\*\//g, '').replace(/\s+/g, ' ').trim();
  return compact(`${root.replace(':root', 'svg').replace(/color-scheme:[^;]*;/, '')} ${figure}`);
}
