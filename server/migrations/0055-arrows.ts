import { DataTypes, type QueryInterface } from 'sequelize';

/** The numbered arrows of a set: weight (gr), spin check, nock or vane note, status. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable(
    'arrows',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      set_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'arrow_sets', key: 'id' }, onDelete: 'CASCADE' },
      number: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false },
      weight_gr: { type: DataTypes.DOUBLE, allowNull: false },
      spin_kind: { type: DataTypes.ENUM('none', 'thou', 'mm', 'pass', 'fail'), allowNull: false, defaultValue: 'none' },
      runout: { type: DataTypes.DOUBLE, allowNull: true },
      note: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      status: { type: DataTypes.ENUM('quiver', 'practice', 'retired'), allowNull: false, defaultValue: 'quiver' },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    },
    { uniqueKeys: { arrows_set_number: { fields: ['set_id', 'number'] } } } as never,
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('arrows');
}
