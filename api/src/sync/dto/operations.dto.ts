import { Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsISO8601,
  IsString,
  IsUUID,
  Length,
  Matches,
  ValidateNested,
  registerDecorator,
  type ValidationOptions,
  IsObject,
} from 'class-validator';
import { Finite, WholeNumber } from '../../common/numbers.js';
import {
  DEFECT_LOCATIONS,
  DEFECT_SEVERITIES,
  DEFECT_TYPES,
} from '../../inspections/entities/defect.entity.js';
import { Measurements } from '../../inspections/dto/measurements.dto.js';
import { Optional } from '../../common/optional.js';

export class LotOpenPayload {
  @IsUUID()
  id: string;

  @IsString()
  @Length(1, 40)
  @Matches(/^[A-Za-z0-9._/-]+$/, {
    message: 'lotNumber may hold letters, digits, dot, dash, slash and underscore',
  })
  lotNumber: string;

  @IsUUID()
  specRevisionId: string;

  @IsUUID()
  pressId: string;

  @WholeNumber(1, 999)
  cavity: number;

  @WholeNumber(1, 1_000_000)
  lotSize: number;

  @IsISO8601({ strict: true })
  moldedAt: string;
}

const STATUSES = ['within', 'near', 'out'] as const;

/** `{ load: 'within', thickness: 'near', … }`: one status per characteristic, up to 20. */
function IsStatuses(options?: ValidationOptions) {
  return (target: object, propertyName: string) =>
    registerDecorator({
      name: 'isStatuses',
      target: target.constructor,
      propertyName,
      options: {
        message: `${propertyName} must map up to 20 characteristic names to within, near or out`,
        ...options,
      },
      validator: {
        validate: (value: unknown) =>
          typeof value === 'object' &&
          value !== null &&
          !Array.isArray(value) &&
          Object.keys(value).length <= 20 &&
          Object.entries(value).every(
            ([name, status]) => /^[a-z][a-zA-Z-]{0,39}$/.test(name) && STATUSES.includes(status),
          ),
      },
    });
}

/**
 * What the tablet showed for the part: the overall and per-characteristic status of the
 * engine's PartVerdict (its words and numbers follow from the measurements, so they stay home).
 */
export class DeviceVerdictDto {
  @IsIn(STATUSES)
  status: (typeof STATUSES)[number];

  @IsBoolean()
  conforming: boolean;

  // A map rather than a list of objects: validating nested objects is what a push spends on.
  @Optional()
  @IsStatuses()
  characteristics?: Record<string, (typeof STATUSES)[number]>;
}

export class InspectionRecordPayload {
  @IsUUID()
  id: string;

  @IsUUID()
  lotId: string;

  @WholeNumber(1, 2000)
  sampleIndex: number;

  @Optional()
  @IsUUID()
  supersedes?: string;

  @IsObject()
  @ValidateNested()
  @Type(() => Measurements)
  measurements: Measurements;

  @IsObject()
  @ValidateNested()
  @Type(() => DeviceVerdictDto)
  deviceVerdict: DeviceVerdictDto;
}

export class DefectRecordPayload {
  @IsUUID()
  id: string;

  @IsUUID()
  lotId: string;

  @Optional()
  @IsUUID()
  inspectionId?: string;

  @IsIn(DEFECT_TYPES)
  type: (typeof DEFECT_TYPES)[number];

  @IsIn(DEFECT_LOCATIONS)
  location: (typeof DEFECT_LOCATIONS)[number];

  @IsIn(DEFECT_SEVERITIES)
  severity: (typeof DEFECT_SEVERITIES)[number];

  @Optional()
  @Finite(0.01, 3000)
  sizeMm?: number;

  @Optional()
  @IsString()
  @Length(0, 1000)
  note?: string;

  @Optional()
  @Matches(/^[0-9a-f]{64}$/, { message: 'photoSha256 must be 64 lowercase hex digits' })
  photoSha256?: string;
}

export class DeviceLotVerdictDto {
  @IsIn(['pass', 'flagged'])
  verdict: 'pass' | 'flagged';

  @WholeNumber(0, 2000)
  nonconforming: number;
}

export class LotSubmitPayload {
  @IsUUID()
  lotId: string;

  @IsObject()
  @ValidateNested()
  @Type(() => DeviceLotVerdictDto)
  deviceVerdict: DeviceLotVerdictDto;
}
