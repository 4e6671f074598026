import type { CSSProperties } from 'react';

/** A tile on a thumbnail sheet, as a tour moment of a record carries it. */
export interface SpriteTile {
  url: string;
  x: number;
  y: number;
  w: number;
  h: number;
}

/**
 * The CSS that shows one tile of a sheet at its own size: the sheet as background, shifted left
 * and up by the tile's position so only that rectangle shows through a w × h box.
 */
export function spriteStyle(tile: SpriteTile): CSSProperties {
  const url = tile.url.replace(/["\\\n\r]/g, (c) => `\\${c === '\n' ? 'a ' : c === '\r' ? 'd ' : c}`);
  return {
    backgroundImage: `url("${url}")`,
    backgroundPosition: `${tile.x === 0 ? 0 : `-${tile.x}px`} ${tile.y === 0 ? 0 : `-${tile.y}px`}`,
    backgroundRepeat: 'no-repeat',
    width: `${tile.w}px`,
    height: `${tile.h}px`,
  };
}
