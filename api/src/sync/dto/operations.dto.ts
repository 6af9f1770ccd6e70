import { Type } from 'class-transformer';
import {
  IsIn,
  IsISO8601,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Matches,
  ValidateNested,
} from 'class-validator';
import { Finite, WholeNumber } from '../../common/numbers.js';
import {
  DEFECT_LOCATIONS,
  DEFECT_SEVERITIES,
  DEFECT_TYPES,
} from '../../inspections/entities/defect.entity.js';
import { Measurements } from '../../inspections/dto/measurements.dto.js';

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

export class InspectionRecordPayload {
  @IsUUID()
  id: string;

  @IsUUID()
  lotId: string;

  @WholeNumber(1, 2000)
  sampleIndex: number;

  @IsOptional()
  @IsUUID()
  supersedes?: string;

  @ValidateNested()
  @Type(() => Measurements)
  measurements: Measurements;

  /** Kept as the tablet sent it (its shape follows the engine's verdict type). */
  @IsObject()
  deviceVerdict: Record<string, unknown>;
}

export class DefectRecordPayload {
  @IsUUID()
  id: string;

  @IsUUID()
  lotId: string;

  @IsOptional()
  @IsUUID()
  inspectionId?: string;

  @IsIn(DEFECT_TYPES)
  type: (typeof DEFECT_TYPES)[number];

  @IsIn(DEFECT_LOCATIONS)
  location: (typeof DEFECT_LOCATIONS)[number];

  @IsIn(DEFECT_SEVERITIES)
  severity: (typeof DEFECT_SEVERITIES)[number];

  @IsOptional()
  @Finite(0.01, 3000)
  sizeMm?: number;

  @IsOptional()
  @IsString()
  @Length(0, 1000)
  note?: string;

  @IsOptional()
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

  @ValidateNested()
  @Type(() => DeviceLotVerdictDto)
  deviceVerdict: DeviceLotVerdictDto;
}
