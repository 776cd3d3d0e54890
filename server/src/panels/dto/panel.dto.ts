import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Allow, ArrayMaxSize, ArrayUnique, IsArray, IsInt, IsOptional, Max, Min } from 'class-validator';

// The document itself is checked by checkPanelDocument from @mantlepiece/shared, which answers with
// a path into the document; class-validator only sees that it is there.
const DOC_EXAMPLE = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Hot rock rises.' }] }] };

export const MAX_WORD_BUDGET = 400;

export class CreatePanelDto {
  @ApiPropertyOptional({ example: DOC_EXAMPLE, description: 'Tiptap JSON; an empty paragraph when left out' })
  @Allow()
  doc?: unknown;

  @ApiPropertyOptional({ description: '0-based place in the story; at the end when left out' })
  @IsOptional()
  @IsInt()
  @Min(0)
  position?: number;

  @ApiPropertyOptional({ description: 'Words that fit the screen' })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(MAX_WORD_BUDGET)
  wordBudget?: number;
}

export class SavePanelDocumentDto {
  @ApiProperty({ example: DOC_EXAMPLE })
  @Allow()
  doc: unknown;

  @ApiProperty({ description: 'The version this edit started from' })
  @IsInt()
  @Min(1)
  version: number;
}

export class UpdatePanelDto {
  @ApiProperty()
  @IsInt()
  @Min(1)
  @Max(MAX_WORD_BUDGET)
  wordBudget: number;
}

export class ReorderPanelsDto {
  @ApiProperty({ type: [Number], description: "Every panel of the story, in the new order" })
  @IsArray()
  @ArrayMaxSize(500)
  @ArrayUnique({ message: 'Each panel appears once.' })
  @IsInt({ each: true })
  panelIds: number[];
}
