import { Equals, IsIn } from 'class-validator';
import { Finite } from '../../common/numbers.js';
import { Optional } from '../../common/optional.js';

export const SHAPES = ['disc', 'annulus', 'square', 'rectangle', 'strip'] as const;

// Plan sizes of molded pads, bushings and bumpers: from a washer to a dock fender.
const PLAN = [0.5, 3000] as const;
const THICKNESS = [0.2, 500] as const;

/** What an unknown `shape` falls back to, so that it is reported by name. */
export class GeometryDto {
  @IsIn(SHAPES)
  shape: (typeof SHAPES)[number];
}

export class DiscDto {
  @Equals('disc')
  shape: 'disc';

  @Finite(...PLAN)
  diameter: number;

  @Finite(...THICKNESS)
  thickness: number;
}

export class AnnulusDto {
  @Equals('annulus')
  shape: 'annulus';

  @Finite(...PLAN)
  outerDiameter: number;

  @Finite(...PLAN)
  innerDiameter: number;

  @Finite(...THICKNESS)
  thickness: number;
}

export class SquareDto {
  @Equals('square')
  shape: 'square';

  @Finite(...PLAN)
  side: number;

  @Finite(...THICKNESS)
  thickness: number;
}

export class RectangleDto {
  @Equals('rectangle')
  shape: 'rectangle';

  @Finite(...PLAN)
  length: number;

  @Finite(...PLAN)
  width: number;

  @Finite(...THICKNESS)
  thickness: number;
}

export class StripDto {
  @Equals('strip')
  shape: 'strip';

  @Finite(...PLAN)
  width: number;

  /** A strip is long enough to ignore its ends; a length makes loads total rather than per mm. */
  @Optional()
  @Finite(...PLAN)
  length?: number;

  @Finite(...THICKNESS)
  thickness: number;
}

export type Geometry = DiscDto | AnnulusDto | SquareDto | RectangleDto | StripDto;

export const GEOMETRY_TYPES = {
  discriminator: {
    property: 'shape',
    subTypes: [
      { value: DiscDto, name: 'disc' },
      { value: AnnulusDto, name: 'annulus' },
      { value: SquareDto, name: 'square' },
      { value: RectangleDto, name: 'rectangle' },
      { value: StripDto, name: 'strip' },
    ],
  },
  keepDiscriminatorProperty: true,
};
