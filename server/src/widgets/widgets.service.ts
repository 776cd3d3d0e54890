import { HttpStatus, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { checkWidget, describeWidgetTypes, type ModelLimitWarning, type WidgetDescriptor } from '@mantlepiece/shared';

export interface WidgetCheckView {
  ok: true;
  params: unknown;
  /** What the widget computes from these params (for the convection cell, its derived numbers). */
  result: unknown;
  /** Allowed settings that take the model outside the range where it holds; preflight shows them. */
  warnings: ModelLimitWarning[];
}

@Injectable()
export class WidgetsService {
  /** The same for every request: built once from the shared zod schemas. */
  private readonly types = describeWidgetTypes();

  listTypes(): { items: WidgetDescriptor[] } {
    return { items: this.types };
  }

  /** The check every save of a panel runs on each widget, so a caption's numbers come from valid settings. */
  check(type: string, params: unknown): WidgetCheckView {
    const check = checkWidget(type, params);
    if (!check.ok) {
      const unknownType = check.errors.length === 1 && check.errors[0]?.path[0] === 'type';
      throw new UnprocessableEntityException({
        statusCode: HttpStatus.UNPROCESSABLE_ENTITY,
        message: unknownType ? check.errors[0]!.message : 'The widget settings are not valid.',
        errors: check.errors,
      });
    }
    return { ok: true, params: check.params, result: check.result, warnings: check.warnings };
  }
}
