'use strict';
// Where the built add-in will be served from.
//
// The sources name one address only: the development server, https://localhost:3000/ (the
// manifest's URLs and the @helpurl tags in functions/functions.ts). A build for a real host
// (`npm run build -- --env base=https://host.example/mooring/`) rewrites that address to the
// given base in what it writes: dist/manifest.xml and the help links in dist/functions.json.
// The pages themselves use relative paths, so they work under any base unchanged.
//
// Help links are written against docs/functions.md in the JSDoc (the reference page a reader of
// the repository opens); the built links point at docs/functions.html, the same reference as a
// page a browser shows, which the build generates beside it.

const DEV_BASE = 'https://localhost:3000/';
const REFERENCE_SOURCE = 'docs/functions.md';
const REFERENCE_PAGE = 'docs/functions.html';

const EXAMPLE = 'https://host.example/mooring/';

/**
 * The base address a build is for: an absolute https URL ending in "/", with no query, fragment
 * or user name. Returns it in the URL parser's normal form (host in lower case).
 * @param {unknown} value what was given to --env base
 * @returns {string}
 */
function checkBase(value) {
  const shown = typeof value === 'string' ? `"${value}"` : 'nothing';
  const refuse = (why) =>
    new Error(
      `--env base${typeof value === 'string' ? `=${value}` : ''}: ${why}. ` +
        `Give the https address the contents of dist/ will be served from, ending in "/", for example --env base=${EXAMPLE}`,
    );
  if (typeof value !== 'string' || value.trim() === '') throw refuse(`the base is missing (got ${shown})`);
  let url;
  try {
    url = new URL(value);
  } catch {
    throw refuse('this is not an absolute address');
  }
  if (url.protocol !== 'https:') throw refuse(`Office loads add-ins only over https, not ${url.protocol.replace(/:$/, '')}`);
  if (url.username !== '' || url.password !== '') throw refuse('an address with a user name or password cannot go into a manifest');
  if (url.search !== '' || value.includes('?')) throw refuse('the base cannot carry a query (?...)');
  if (url.hash !== '' || value.includes('#')) throw refuse('the base cannot carry a fragment (#...)');
  if (!value.endsWith('/')) throw refuse('the base must end in "/" (the folder that holds manifest.xml)');
  if (/[\s"'<>&\\]/.test(url.href)) throw refuse('the address holds a character that cannot stand in a manifest attribute');
  return url.href;
}

/**
 * The manifest with every URL at the development server moved to the base. Every other
 * http(s) address in an attribute value is refused, so nothing in the result can still point
 * at a machine the build was not made for.
 * @param {string} xml manifest/manifest.xml as written
 * @param {string} base a value checkBase returned
 * @returns {string}
 */
function rewriteManifest(xml, base) {
  const foreign = [];
  const rewritten = xml.replace(/(DefaultValue=")(https?:\/\/[^"]*)"/g, (_match, head, url) => {
    if (!url.startsWith(DEV_BASE)) {
      foreign.push(url);
      return `${head}${url}"`;
    }
    return `${head}${base}${url.slice(DEV_BASE.length)}"`;
  });
  if (foreign.length > 0) {
    throw new Error(`manifest/manifest.xml names addresses outside ${DEV_BASE}, which the build cannot move: ${foreign.join(', ')}`);
  }
  if (base === DEV_BASE) return rewritten;
  // Say in the built file which base it was made for. (No double hyphen may stand in an XML comment.)
  const note = `<!-- Built for ${base}: every add-in URL below points there (the note below describes the source file). -->\n`;
  const declaration = /^<\?xml[^>]*\?>\r?\n/.exec(rewritten);
  return declaration ? `${declaration[0]}${note}${rewritten.slice(declaration[0].length)}` : `${note}${rewritten}`;
}

/**
 * A help link from the JSDoc (at the development server, on the Markdown reference) as the
 * built add-in serves it: at the base, on the HTML reference, with the same #anchor.
 * @param {string} url
 * @param {string} base
 * @returns {string}
 */
function rewriteHelpUrl(url, base) {
  const source = `${DEV_BASE}${REFERENCE_SOURCE}#`;
  if (typeof url !== 'string' || !url.startsWith(source) || url.length === source.length) {
    throw new Error(`help link ${JSON.stringify(url)} is not of the form ${source}<anchor>; the @helpurl tags in functions/ must use it`);
  }
  return `${base}${REFERENCE_PAGE}#${url.slice(source.length)}`;
}

module.exports = { DEV_BASE, REFERENCE_SOURCE, REFERENCE_PAGE, checkBase, rewriteManifest, rewriteHelpUrl };
