import { BadRequestException, Injectable, type PipeTransform } from '@nestjs/common';

/** Accepts a SHA-256 fingerprint in hex (any case) and hands it on in lower case. */
@Injectable()
export class FingerprintPipe implements PipeTransform<string, string> {
  transform(value: string): string {
    const normalised = value.trim().toLowerCase();
    if (!/^[0-9a-f]{64}$/.test(normalised)) {
      throw new BadRequestException({
        message: 'fingerprint must be 64 hexadecimal characters (SHA-256)',
        field: 'fingerprint',
      });
    }
    return normalised;
  }
}
