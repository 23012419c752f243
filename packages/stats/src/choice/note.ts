/**
 * A sentence the engine writes, with a stable code and the numbers behind it, so that
 * consumers can act on the code (and translate or restyle) without searching English text.
 */
export interface Note {
  code: string;
  params: Record<string, string | number>;
  text: string;
}

export function note(code: string, params: Note["params"], text: string): Note {
  return { code, params, text };
}
