// After the web export: brotli (quality 11) and gzip (level 9) copies of every text asset and
// font, served by express-static-gzip to browsers that accept them. Done once at build time,
// so no request pays for compression.
const fs = require('node:fs');
const path = require('node:path');
const zlib = require('node:zlib');

const ROOT = path.resolve(__dirname, '..', 'dist');
const COMPRESSIBLE = /\.(js|css|html|json|svg|ttf|otf|ico|txt|webmanifest)$/;
const MIN_BYTES = 1024;

function* files(dir) {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* files(full);
    else if (COMPRESSIBLE.test(entry.name)) yield full;
  }
}

let raw = 0;
let br = 0;
let count = 0;
for (const file of files(ROOT)) {
  const content = fs.readFileSync(file);
  if (content.length < MIN_BYTES) continue;
  const brotli = zlib.brotliCompressSync(content, {
    params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: content.length },
  });
  fs.writeFileSync(`${file}.br`, brotli);
  fs.writeFileSync(`${file}.gz`, zlib.gzipSync(content, { level: 9 }));
  raw += content.length;
  br += brotli.length;
  count += 1;
}
console.log(`compressed ${count} files: ${Math.round(raw / 1024)} KB -> ${Math.round(br / 1024)} KB brotli`);
