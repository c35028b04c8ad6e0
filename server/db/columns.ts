import { DataTypes, Model, type CreationOptional, type DataType, type InferAttributes, type InferCreationAttributes, type ModelAttributeColumnOptions } from 'sequelize';

// The column definitions every model repeats, grouped by kind. Each call builds fresh objects:
// Sequelize writes into attribute definitions, so one object must never serve two attributes.

type Columns<K extends string> = Record<K, ModelAttributeColumnOptions>;

function columnsOf<K extends string>(names: K[], make: () => ModelAttributeColumnOptions): Columns<K> {
  return Object.fromEntries(names.map((name) => [name, make()])) as Columns<K>;
}

/** Columns that must hold a value (NOT NULL, no default). */
export const required = <K extends string>(type: DataType, ...names: K[]) => columnsOf(names, () => ({ type, allowNull: false }));

/** Columns that may be NULL and are stored as NULL when a create leaves them out. */
export const optional = <K extends string>(type: DataType, ...names: K[]) =>
  columnsOf(names, () => ({ type, allowNull: true, defaultValue: null }));

/** Columns that may be NULL and that every create names (no model default). */
export const nullable = <K extends string>(type: DataType, ...names: K[]) => columnsOf(names, () => ({ type, allowNull: true }));

/** A NOT NULL column with a default the database and the model agree on. */
export const withDefault = (type: DataType, defaultValue: unknown): ModelAttributeColumnOptions => ({ type, allowNull: false, defaultValue });

/** `id serial PRIMARY KEY` (or `bigserial` with `DataTypes.BIGINT`). */
export const serialId = (type: DataType = DataTypes.INTEGER) => ({ id: { type, autoIncrement: true, primaryKey: true } });

/** A client-made UUID primary key (a retried save sends the same id). */
export const uuidId = () => ({ id: { type: DataTypes.UUID, primaryKey: true } });

export const createdAt = () => ({ createdAt: DataTypes.DATE });

export const timestamps = () => ({ createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE });

/**
 * The attributes of a table made with `id serial` and both timestamps (most of them): a model
 * extends `SerialRow<Itself>` and declares only its own columns.
 */
export abstract class SerialRow<M extends Model> extends Model<InferAttributes<M>, InferCreationAttributes<M>> {
  declare id: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}
