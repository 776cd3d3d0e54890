import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayUnique, IsArray, IsObject } from 'class-validator';
import { IsIntBetween, IsRowId, Omittable, UNSIGNED_INT_MAX } from '../../common/validation.js';

// The document itself is checked by checkPanelDocument from @mantlepiece/shared, which answers with
// a path into the document; class-validator only sees that it is an object.
const DOC_MESSAGE = { message: 'The document is a Tiptap JSON object.' };
const DOC_EXAMPLE = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Hot rock rises.' }] }] };
// The same schema the panels are answered with, so a document read can be sent back as it is.
const PANEL_DOC_SCHEMA = { allOf: [{ $ref: '#/components/schemas/PanelDocJSON' }], example: DOC_EXAMPLE };

export const MAX_WORD_BUDGET = 400;

export class CreatePanelDto {
  @ApiProperty({ ...PANEL_DOC_SCHEMA, description: 'Tiptap JSON; an empty paragraph when left out' })
  @Omittable()
  @IsObject(DOC_MESSAGE)
  doc?: unknown;

  @ApiProperty({ description: '0-based place in the story; at the end when left out' })
  @Omittable()
  @IsIntBetween(0, UNSIGNED_INT_MAX)
  position?: number;

  @ApiProperty({ description: 'Words that fit the screen' })
  @Omittable()
  @IsIntBetween(1, MAX_WORD_BUDGET)
  wordBudget?: number;
}

export class SavePanelDocumentDto {
  @ApiProperty(PANEL_DOC_SCHEMA)
  @IsObject(DOC_MESSAGE)
  doc: unknown;

  @ApiProperty({ description: 'The version this edit started from' })
  @IsIntBetween(1, UNSIGNED_INT_MAX)
  version: number;
}

export class UpdatePanelDto {
  @ApiProperty()
  @IsIntBetween(1, MAX_WORD_BUDGET)
  wordBudget: number;
}

export class ReorderPanelsDto {
  @ApiProperty({ type: [Number], description: 'Every panel of the story, in the new order' })
  @IsArray()
  @ArrayMaxSize(500)
  @ArrayUnique({ message: 'Each panel appears once.' })
  @IsRowId({ each: true })
  panelIds: number[];
}
