import { BeforeBulkDestroy, BeforeBulkUpdate, BeforeDestroy, BeforeUpdate } from 'sequelize-typescript';

/**
 * Runs a model's static method before every update and delete, one row or in bulk. For the
 * append-only trails (audit events, verdicts): the method throws, so the model itself refuses the
 * change, whatever code asks.
 */
export function BeforeAnyChange(target: object, propertyName: string): void {
  for (const hook of [BeforeUpdate, BeforeBulkUpdate, BeforeDestroy, BeforeBulkDestroy]) hook(target, propertyName);
}
