import { fileTypeFromFile } from 'file-type';

export interface SniffedType {
  ext: string;
  mime: string;
}

/** The type a file really is, read from its first bytes (file-type); undefined for text and unknown formats. */
export class FileSniffer {
  async sniff(path: string): Promise<SniffedType | undefined> {
    const found = await fileTypeFromFile(path);
    return found ? { ext: found.ext, mime: found.mime } : undefined;
  }
}

export const SNIFFER = Symbol('SNIFFER');
