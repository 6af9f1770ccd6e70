import { IsEmail, MaxLength } from 'class-validator';

export class TestMailDto {
  @IsEmail()
  @MaxLength(254)
  to: string;
}
