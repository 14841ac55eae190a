import { useEffect, useState } from 'react';
import { Spinner } from './loading';

type Modules = { size: number; dark: (row: number, col: number) => boolean };

// The qrcode package is only needed on the labels page: fetched when a code is first drawn.
async function modulesOf(text: string): Promise<Modules> {
  const { create } = await import('qrcode');
  // Medium correction: a label gets scuffed and taped over at the edges.
  const { modules } = create(text, { errorCorrectionLevel: 'M' });
  return { size: modules.size, dark: (row, col) => Boolean(modules.get(row, col)) };
}

/** One square per dark module, as a single path: crisp at any print size. */
function pathOf({ size, dark }: Modules): string {
  let d = '';
  for (let row = 0; row < size; row += 1) {
    for (let col = 0; col < size; col += 1) if (dark(row, col)) d += `M${col} ${row}h1v1h-1z`;
  }
  return d;
}

// The standard asks for four modules of light margin around the symbol.
const QUIET = 4;

/**
 * A QR code of `value`, drawn as SVG in the browser (nothing leaves the tablet). Dark on white
 * whatever the theme: readers expect it that way round. `value` is also on the element
 * (`data-value`, title) so it can be read back without decoding the image.
 */
export function QrCode({ value, label, className = '' }: { value: string; label: string; className?: string }) {
  const [drawn, setDrawn] = useState<{ value: string; path: string; size: number } | null>(null);
  const [failed, setFailed] = useState(false);

  useEffect(() => {
    let current = true;
    modulesOf(value).then(
      (modules) => current && setDrawn({ value, path: pathOf(modules), size: modules.size }),
      () => current && setFailed(true),
    );
    return () => {
      current = false;
    };
  }, [value]);

  if (failed) return <p className={`text-center text-sm ${className}`}>QR code could not be drawn: {value}</p>;
  if (!drawn || drawn.value !== value) {
    return (
      <span role="status" className={`flex aspect-square items-center justify-center ${className}`}>
        <Spinner />
        <span className="sr-only">Drawing the QR code</span>
      </span>
    );
  }
  const box = drawn.size + QUIET * 2;
  return (
    <svg
      viewBox={`${-QUIET} ${-QUIET} ${box} ${box}`}
      role="img"
      aria-label={label}
      data-value={value}
      shapeRendering="crispEdges"
      className={`bg-white text-black ${className}`}
    >
      <title>{value}</title>
      <path d={drawn.path} fill="currentColor" />
    </svg>
  );
}
