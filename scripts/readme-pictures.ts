// Regenerates the README's pictures from the demo spec, so they never drift from the code:
//   npx tsx scripts/readme-pictures.ts
// writes docs/images/preview.png, docs/images/assembly.png, docs/images/stand-parts.png, docs/images/template-page1.png,
// and for each planar type docs/images/face-<name>.png (its preview.png) and docs/images/assembly-<name>.png (its assembly.svg at 2 px/mm)
// (the last one rasterised from template.pdf with poppler-utils' pdftoppm, when installed).
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { buildFiles, readSpecFile, buildAnyFiles } from '@umbrafab/cli';
import { flatStand, pieceRows } from '@umbrafab/geometry';
import { piecesDrawing, toCutSvg, toPngAsync } from '@umbrafab/fabricate';

/** Two pictures per planar face type, from fixtures/planar/ (docs/images/face-<name>.png and assembly-<name>.png). */
const PLANAR_PICTURES = ['garden-horizontal', 'wall-declining', 'wall-reclining', 'meridian-east', 'equatorial'];

const ROOT = resolve(import.meta.dirname, '..');
const OUT = join(ROOT, 'docs/images');

async function run(): Promise<void> {
  const spec = readSpecFile(join(ROOT, 'fixtures/demo.yaml'));
  const result = await buildFiles(spec);
  const file = (name: string) => {
    const f = result.files.find((x) => x.name === name);
    if (!f) throw new Error(`the demo build wrote no ${name}`);
    return f.bytes;
  };
  mkdirSync(OUT, { recursive: true });
  writeFileSync(join(OUT, 'preview.png'), file('preview.png'));
  writeFileSync(join(OUT, 'assembly.png'), file('assembly.png'));
  const written = ['preview.png', 'assembly.png'];
  // The demo's flat-pack stand as cut: the very drawing of stand.dxf, as a true-scale SVG, rasterised.
  const stand = flatStand(result.layout);
  // (the cutter's hairlines, 0.05 mm, widened to 0.6 mm so the picture reads at README size; a white page behind)
  const standSvg = toCutSvg(piecesDrawing(stand.parts, pieceRows(stand.parts), new Map(), []))
    .replaceAll('stroke-width="0.05"', 'stroke-width="0.6"')
    .replace(/(<svg[^>]*>)/, '$1<rect x="-1000" y="-1000" width="4000" height="4000" fill="#ffffff"/>');
  writeFileSync(join(OUT, 'stand-parts.png'), await toPngAsync(standSvg, { pxPerMm: 2 }));
  written.push('stand-parts.png');
  try {
    const dir = mkdtempSync(join(tmpdir(), 'umbrafab-readme-'));
    writeFileSync(join(dir, 'template.pdf'), file('template.pdf'));
    execFileSync('pdftoppm', ['-r', '50', '-png', '-f', '1', '-l', '1', '-singlefile', join(dir, 'template.pdf'), join(dir, 'page')]);
    writeFileSync(join(OUT, 'template-page1.png'), readFileSync(join(dir, 'page.png')));
    written.push('template-page1.png');
  } catch (e) {
    console.warn(`readme-pictures: template-page1.png skipped (pdftoppm from poppler-utils needed): ${(e as Error).message.split('\n')[0]}`);
  }
  for (const name of PLANAR_PICTURES) {
    const built = await buildAnyFiles(readSpecFile(join(ROOT, `fixtures/planar/${name}.yaml`)));
    const png = built.files.find((f) => f.name === 'preview.png');
    if (!png) throw new Error(`fixtures/planar/${name}.yaml wrote no preview.png`);
    writeFileSync(join(OUT, `face-${name}.png`), png.bytes);
    written.push(`face-${name}.png`);
    // The face as it stands (assembly.png), rendered at 2 px/mm from build's own assembly.svg to keep the README light.
    const svg = built.files.find((f) => f.name === 'assembly.svg');
    if (!svg) throw new Error(`fixtures/planar/${name}.yaml wrote no assembly.svg`);
    writeFileSync(join(OUT, `assembly-${name}.png`), await toPngAsync(new TextDecoder().decode(svg.bytes), { pxPerMm: 2 }));
    written.push(`assembly-${name}.png`);
  }
  console.log(`readme-pictures: wrote ${written.map((n) => `docs/images/${n}`).join(', ')}`);
}

run().catch((e) => {
  console.error(e);
  process.exit(1);
});
