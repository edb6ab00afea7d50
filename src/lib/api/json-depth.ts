/**
 * Nesting depth of a JSON text, checked before JSON.parse so that a body such as
 * "[[[[…]]]]" 60 000 levels deep never reaches the parser or the validator's recursion.
 */

const OPEN_OBJECT = 123; // {
const OPEN_ARRAY = 91; // [
const CLOSE_OBJECT = 125; // }
const CLOSE_ARRAY = 93; // ]
const QUOTE = 34; // "
const BACKSLASH = 92; // \

/**
 * True when no object or array in the text nests deeper than maxDepth (the top level is 1).
 * Brackets inside strings do not count. The text need not be valid JSON; the parser decides that.
 */
export function withinDepth(text: string, maxDepth: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === BACKSLASH) i++;
      else if (c === QUOTE) inString = false;
    } else if (c === QUOTE) {
      inString = true;
    } else if (c === OPEN_OBJECT || c === OPEN_ARRAY) {
      if (++depth > maxDepth) return false;
    } else if (c === CLOSE_OBJECT || c === CLOSE_ARRAY) {
      depth--;
    }
  }
  return true;
}
