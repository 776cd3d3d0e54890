import { BadRequestException, ConflictException, ForbiddenException, HttpException, HttpStatus, UnprocessableEntityException } from '@nestjs/common';
import type { PreflightEntry, WorkflowRefusal } from '@mantlepiece/shared';

/** A refusal of the shared `decide` as the answer the review contract gives for it. */
export function workflowRefusal(reason: WorkflowRefusal, message: string): HttpException {
  if (reason === 'forbidden' || reason === 'self_approval') return new ForbiddenException(message);
  if (reason === 'note_required') return new BadRequestException({ statusCode: HttpStatus.BAD_REQUEST, message, errors: [{ path: ['note'], message }] });
  return new ConflictException(message);
}

/** A submission or an approval refused while preflight blockers stand: each blocker located by its check and panel. */
export function blockedByPreflight(blockers: readonly PreflightEntry[], refused: 'submission' | 'approval'): UnprocessableEntityException {
  const count = blockers.length === 1 ? 'a preflight blocker' : `${blockers.length} preflight blockers`;
  return new UnprocessableEntityException({
    statusCode: HttpStatus.UNPROCESSABLE_ENTITY,
    message: refused === 'submission'
      ? `This story cannot be submitted for review while it has ${count}; fix ${blockers.length === 1 ? 'it' : 'them'} and submit again.`
      : `This revision cannot be approved while it has ${count}; ask for changes instead.`,
    errors: blockers.map((blocker) => ({
      path: ['preflight', blocker.check, ...(blocker.panelId === undefined ? [] : [blocker.panelId])],
      message: blocker.message,
    })),
  });
}
