import type { Request } from 'express';
import type { User } from '../users/models/user.model.js';

export interface AuthenticatedRequest extends Request {
  user: User;
}
