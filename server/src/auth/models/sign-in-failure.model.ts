import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'sign_in_failures', updatedAt: false })
export class SignInFailure extends Model {
  @Column({ type: DataType.STRING(254), allowNull: false })
  email: string;

  @Column({ type: DataType.STRING(64), allowNull: false })
  clientAddress: string;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare createdAt: Date;
}
