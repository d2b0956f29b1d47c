import { BadRequestException, ParseIntPipe } from '@nestjs/common';

/** Parses a whole-number route parameter, answering 400 that names the parameter otherwise. */
export const intParam = (name: string): ParseIntPipe =>
  new ParseIntPipe({
    exceptionFactory: () =>
      new BadRequestException({ message: `${name} must be a whole number`, field: name }),
  });
