import type { Role } from './roles.js';

/** A signed-in person as the API shows them; never carries a hash or a token. */
export interface VenueMembershipView {
  venueId: number;
  roles: Role[];
  locales: string[];
}

export interface UserView {
  id: number;
  email: string;
  name: string;
  /** Roles held at every venue (the organisation admin's, or anyone not narrowed to venues). */
  roles: Role[];
  /** BCP 47 tags a translator may translate into, at every venue. */
  locales: string[];
  /** Roles and locales held at one venue each. */
  memberships: VenueMembershipView[];
  /** The UI language the person chose for the studio and for their mail. */
  uiLanguage: string;
  active: boolean;
  /** @format date-time */
  createdAt: string;
  /** @format date-time */
  lastSignInAt: string | null;
}

export interface SessionView {
  accessToken: string;
  user: UserView;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** Every error body the API sends. `errors` locates each problem, field by field. */
export interface ApiErrorBody {
  statusCode: number;
  message: string;
  errors?: { path: (string | number)[]; message: string }[];
}
