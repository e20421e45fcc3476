// Writes a .br and a .gz beside each content-hashed file of a web export, once, so the server
// sends them as they are instead of compressing the same megabytes again for every new visitor
// (gzip of the 1.6 MB entry bundle costs ~30 ms of server time per cold load).
const fs = require('node:fs');
const path = require('node:path');
const zlib = require('node:zlib');

const COMPRESSIBLE = /\.(js|css|ttf|otf|svg|json|map)$/;
const MIN_BYTES = 1024;

function filesUnder(dir) {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? filesUnder(path.join(dir, e.name)) : [path.join(dir, e.name)]));
}

/** Compresses the export in `webDir`; returns how many files and bytes it wrote. */
function compressWebExport(webDir) {
  let files = 0;
  let bytes = 0;
  for (const file of [...filesUnder(path.join(webDir, '_expo')), ...filesUnder(path.join(webDir, 'assets'))]) {
    if (!COMPRESSIBLE.test(file) || file.endsWith('.map')) continue;
    const body = fs.readFileSync(file);
    if (body.length < MIN_BYTES) continue;
    const br = zlib.brotliCompressSync(body, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length } });
    const gz = zlib.gzipSync(body, { level: 9 });
    fs.writeFileSync(`${file}.br`, br);
    fs.writeFileSync(`${file}.gz`, gz);
    files += 1;
    bytes += br.length + gz.length;
  }
  return { files, bytes };
}

module.exports = { compressWebExport };

if (require.main === module) {
  const dir = path.resolve(process.argv[2] ?? path.join(__dirname, '..', 'dist'));
  const started = Date.now();
  const { files } = compressWebExport(dir);
  console.log(`[dilato] compressed ${files} files of ${dir} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}
