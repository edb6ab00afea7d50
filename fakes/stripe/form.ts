/**
 * Decode the SDK's form encoding (`a[b][0][c]=x`) into nested objects. Keys that are all numeric
 * become arrays, as the SDK encodes arrays by index.
 */
export type FormValue = string | FormValue[] | { [key: string]: FormValue };
export type FormObject = { [key: string]: FormValue };

export function parseForm(body: string): FormObject {
  const root: FormObject = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = key.replace(/\]/g, '').split('[');
    let node: FormObject = root;
    path.forEach((part, i) => {
      if (i === path.length - 1) {
        node[part] = value;
        return;
      }
      if (typeof node[part] !== 'object') node[part] = {};
      node = node[part] as FormObject;
    });
  }
  return arraysFromIndexes(root) as FormObject;
}

function arraysFromIndexes(value: FormValue): FormValue {
  if (typeof value === 'string' || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  const mapped = Object.fromEntries(keys.map((k) => [k, arraysFromIndexes(value[k])]));
  if (keys.length > 0 && keys.every((k) => /^\d+$/.test(k))) {
    return keys.sort((a, b) => Number(a) - Number(b)).map((k) => mapped[k]);
  }
  return mapped;
}

/** Read a string field, or undefined. */
export function str(obj: FormValue | undefined, key: string): string | undefined {
  if (!obj || typeof obj !== 'object' || Array.isArray(obj)) return undefined;
  const v = obj[key];
  return typeof v === 'string' ? v : undefined;
}

/** Read a nested object field, or an empty object. */
export function sub(obj: FormValue | undefined, key: string): FormObject {
  if (!obj || typeof obj !== 'object' || Array.isArray(obj)) return {};
  const v = obj[key];
  return v && typeof v === 'object' && !Array.isArray(v) ? v : {};
}

/** Read an array field (of objects or strings), or an empty array. */
export function list(obj: FormValue | undefined, key: string): FormValue[] {
  if (!obj || typeof obj !== 'object' || Array.isArray(obj)) return [];
  const v = obj[key];
  if (Array.isArray(v)) return v;
  return typeof v === 'string' ? [v] : [];
}

/** Metadata as a flat string map. */
export function metadata(obj: FormValue | undefined): Record<string, string> {
  const m = sub(obj, 'metadata');
  return Object.fromEntries(Object.entries(m).filter(([, v]) => typeof v === 'string')) as Record<
    string,
    string
  >;
}
