import { Injectable } from '@nestjs/common';
import { DomainError } from '../common/domain-error';
import type { RequestUser } from '../auth/request-user';
import { CreateReadingDto, INPUT_FIELDS, METHOD_FIELDS } from './dto/create-reading.dto';
import { VoidReadingDto } from './dto/void-reading.dto';
import type { ReadingInputs } from './reading-compute';
import { ReadingsRefused, ReadingWriter } from './reading-writer';

/** The inputs of the reading's method; 400 naming any field another method uses. */
export function methodInputs(dto: CreateReadingDto): ReadingInputs {
  const allowed = METHOD_FIELDS[dto.method];
  const foreign = INPUT_FIELDS.filter((f) => dto[f] !== undefined && !allowed.includes(f));
  if (foreign.length) {
    throw DomainError.invalid(
      foreign.map((f) => ({ field: f, message: `${f} is not used by the ${dto.method} method` })),
    );
  }
  const inputs: ReadingInputs = {};
  for (const f of allowed) {
    const v = dto[f as (typeof INPUT_FIELDS)[number]];
    if (v !== undefined) inputs[f as keyof ReadingInputs] = v;
  }
  return inputs;
}

/** The clerk's form and QA's void, through the one reading write path (ReadingWriter). */
@Injectable()
export class ReadingsService {
  constructor(private readonly writer: ReadingWriter) {}

  async create(sampleId: number, dto: CreateReadingDto, actor: RequestUser) {
    const entry = {
      sampleId,
      method: dto.method,
      inputs: methodInputs(dto),
      instrumentIds: dto.instrumentIds,
    };
    try {
      const [view] = await this.writer.write([entry], actor);
      return view;
    } catch (e) {
      throw e instanceof ReadingsRefused ? e.refusals[0].error : e;
    }
  }

  void(id: number, dto: VoidReadingDto, actor: RequestUser) {
    return this.writer.void(id, dto.reason, actor);
  }
}
