/** Minimal types for piexifjs 1.0.6 (an independent EXIF writer used as a test oracle). */
declare module 'piexifjs' {
  const piexif: {
    dump(exif: Record<string, Record<number, unknown>>): string;
    insert(exif: string, jpeg: string): string;
    load(jpeg: string): Record<string, Record<number, unknown>>;
    ImageIFD: Record<string, number>;
    ExifIFD: Record<string, number>;
    GPSIFD: Record<string, number>;
  };
  export default piexif;
}
