import { BadRequestException, ParseUUIDPipe } from '@nestjs/common';

/** Parses a UUID route parameter, answering 400 that names the parameter when it is not one. */
export const uuidParam = (name: string): ParseUUIDPipe =>
  new ParseUUIDPipe({
    exceptionFactory: () =>
      new BadRequestException({ message: `${name} must be a UUID`, field: name }),
  });
