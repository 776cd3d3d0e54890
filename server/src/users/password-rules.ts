import { dictionary } from '@zxcvbn-ts/language-common';
import { MIN_PASSWORD_LENGTH, PASSWORD_PROBLEMS, passwordProblem } from '@mantlepiece/shared';
import { ValidateBy, type ValidationOptions } from 'class-validator';

/**
 * The common passwords of zxcvbn-ts's list (about 49,000, lower case) that are long enough to
 * pass the length rule at all; the rest could never reach this check.
 */
const COMMON_PASSWORDS = new Set(dictionary['passwords-common'].filter((word) => [...word].length >= MIN_PASSWORD_LENGTH));

export const isCommonPassword = (password: string): boolean => COMMON_PASSWORDS.has(password.toLowerCase());

/** A new password as NIST SP 800-63B asks; the message says which rule it broke. */
export const IsAcceptablePassword = (options?: ValidationOptions) =>
  ValidateBy({
    name: 'isAcceptablePassword',
    validator: {
      validate: (value: unknown) => typeof value === 'string' && passwordProblem(value, isCommonPassword) === null,
      defaultMessage: (args) => {
        const problem = typeof args?.value === 'string' ? passwordProblem(args.value, isCommonPassword) : null;
        return problem ? PASSWORD_PROBLEMS[problem] : 'Enter a password.';
      },
    },
  }, options);
