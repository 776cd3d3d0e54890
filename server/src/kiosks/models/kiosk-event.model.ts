import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { KioskEventType, KioskSwitch } from '@mantlepiece/shared';
import { Kiosk } from './kiosk.model.js';

/** An anonymous visitor interaction, keyed by the kiosk's random id so a retried upload is stored once. */
@Table({ tableName: 'kiosk_events', timestamps: false })
export class KioskEvent extends Model {
  @Column({ type: DataType.CHAR(36), primaryKey: true })
  declare id: string;

  @ForeignKey(() => Kiosk)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  kioskId: number;

  @BelongsTo(() => Kiosk)
  kiosk?: Kiosk;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false })
  galleryId: number;

  @Column({ type: DataType.STRING(40), allowNull: false })
  type: KioskEventType;

  @Column({ type: DataType.DATE(3), allowNull: false })
  at: Date;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  storyId: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  panelId: number | null;

  @Column({ type: DataType.STRING(60), allowNull: true })
  widgetType: string | null;

  @Column({ type: DataType.STRING(60), allowNull: true })
  param: string | null;

  @Column({ type: DataType.STRING(35), allowNull: true })
  locale: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  dwellMs: number | null;

  @Column({ type: DataType.STRING(40), allowNull: true })
  switch: KioskSwitch | null;

  @Column({ type: DataType.DATE(3), allowNull: false })
  receivedAt: Date;
}
