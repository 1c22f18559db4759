import { type CreationOptional, DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

import { FILE_KINDS, type FileKind, type StoredFile as StoredFileView } from '../../shared/files';

export class StoredFile extends Model<InferAttributes<StoredFile>, InferCreationAttributes<StoredFile>> {
  declare id: CreationOptional<number>;
  declare jobId: number;
  declare kind: FileKind;
  declare originalName: string;
  declare contentType: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare storageKey: string;
  declare uploadedById: number;
  declare detachedAt: Date | null;
  declare caption: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  toView(): StoredFileView {
    return {
      id: this.id,
      kind: this.kind,
      name: this.originalName,
      contentType: this.contentType,
      sizeBytes: Number(this.sizeBytes),
      sha256: this.sha256,
      uploadedAt: this.createdAt.toISOString(),
      caption: this.caption ?? null,
    };
  }

  static initModel(sequelize: Sequelize) {
    StoredFile.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        jobId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.ENUM(...FILE_KINDS), allowNull: false },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        contentType: { type: DataTypes.STRING(100), allowNull: false },
        sizeBytes: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        storageKey: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        uploadedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        detachedAt: { type: DataTypes.DATE(3), allowNull: true },
        caption: { type: DataTypes.STRING(300), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'files', updatedAt: false },
    );
  }
}
