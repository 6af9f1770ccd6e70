import { IsString, Length, Matches } from 'class-validator';
import { Optional } from '../../common/optional.js';

export class CreateSpecDto {
  @IsString()
  @Length(1, 40)
  @Matches(/^[A-Za-z0-9._/-]+$/, {
    message: 'partNumber may hold letters, digits, dot, dash, slash and underscore',
  })
  partNumber: string;

  @IsString()
  @Length(1, 120)
  name: string;

  @Optional()
  @IsString()
  @Length(0, 1000)
  description?: string;
}
