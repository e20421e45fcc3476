/** Writes a .br and a .gz beside each content-hashed file of the web export in `webDir`. */
export function compressWebExport(webDir: string): { files: number; bytes: number };
