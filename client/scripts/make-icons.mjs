// Renders client/public/icon.svg to the PNG icons the web manifest lists.
// Run after changing the SVG: `npm run icons` (in client/), then commit public/icons/.
import { readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { Resvg } from '@resvg/resvg-js';

const publicDir = new URL('../public/', import.meta.url);
const outDir = new URL('icons/', publicDir);
const source = readFileSync(new URL('icon.svg', publicDir), 'utf8');

if (!source.includes('id="bg"') || !source.includes('<g id="mark"')) {
  throw new Error('icon.svg needs a <rect id="bg"> and a <g id="mark">: the variants below edit them.');
}

// Full-bleed square: launchers (maskable) and iOS draw their own rounded shape.
const square = source.replace(/(<rect id="bg"[^>]*?) rx="\d+"/, '$1');
// Maskable: keep the mark inside the central 80 % safe circle, so shrink it about the centre.
const maskable = square.replace('<g id="mark"', '<g transform="translate(256 256) scale(0.78) translate(-256 -256)"><g id="mark"')
  .replace('</g>\n</svg>', '</g></g>\n</svg>');

const targets = [
  { file: 'icon-192.png', svg: source, size: 192 },
  { file: 'icon-512.png', svg: source, size: 512 },
  { file: 'icon-maskable-512.png', svg: maskable, size: 512 },
  { file: 'apple-touch-icon-180.png', svg: square, size: 180 },
];

mkdirSync(outDir, { recursive: true });
for (const { file, svg, size } of targets) {
  const png = new Resvg(svg, { fitTo: { mode: 'width', value: size } }).render().asPng();
  writeFileSync(new URL(file, outDir), png);
  console.log(`${file}: ${size}x${size}, ${png.length} bytes`);
}
