import { EmailField } from '../../users/dto/user-fields.js';

export class RequestPasswordResetDto {
  @EmailField()
  email: string;
}
