/**
 * JSON.parse keeps the last of two equal keys without a word, so a guide with two steps of
 * the same id would silently lose one. This scan (of text that JSON.parse accepted) lists
 * every repeated key with the path of the object it sits in, e.g. "states › check-water".
 */
export function findDuplicateKeys(text: string): { path: string[]; key: string }[] {
  type Frame = { object: boolean; keys: Set<string>; expectKey: boolean; lastKey?: string; path: string[] };
  const found: { path: string[]; key: string }[] = [];
  const stack: Frame[] = [];
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    const top = stack[stack.length - 1];
    if (ch === '"') {
      let j = i + 1;
      while (j < text.length && text[j] !== '"') j += text[j] === "\\" ? 2 : 1;
      const value = JSON.parse(text.slice(i, j + 1)) as string;
      if (top?.object && top.expectKey) {
        if (top.keys.has(value)) found.push({ path: top.path, key: value });
        top.keys.add(value);
        top.lastKey = value;
        top.expectKey = false;
      }
      i = j;
    } else if (ch === "{" || ch === "[") {
      const path = top ? [...top.path, ...(top.object && top.lastKey !== undefined ? [top.lastKey] : [])] : [];
      stack.push({ object: ch === "{", keys: new Set(), expectKey: ch === "{", path });
    } else if (ch === "}" || ch === "]") {
      stack.pop();
    } else if (ch === "," && top?.object) {
      top.expectKey = true;
    }
  }
  return found;
}
