/**
 * SVG to PNG through @resvg/resvg-js, an optional dependency: when it is not installed, the
 * error says so and how to get it.
 */
import { InputError } from '../errors.js';

interface ResvgModule {
  Resvg: new (svg: string, options?: object) => { render(): { asPng(): Uint8Array } };
}

export async function svgToPng(svg: string): Promise<Uint8Array> {
  let mod: ResvgModule;
  try {
    const name = '@resvg/resvg-js';
    mod = (await import(name)) as ResvgModule;
  } catch {
    throw new InputError(
      'PNG output needs the optional package @resvg/resvg-js: run `npm install @resvg/resvg-js`, or write .svg',
    );
  }
  return new mod.Resvg(svg, { font: { loadSystemFonts: true }, background: '#ffffff' }).render().asPng();
}
