// subset-font ships no type declarations; this is the part Passline calls.
declare module 'subset-font' {
  export default function subsetFont(
    font: Uint8Array,
    text: string,
    options?: { targetFormat?: 'truetype' | 'sfnt' | 'woff' | 'woff2' },
  ): Promise<Uint8Array>;
}
