import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A bow's tuning set-up as dated entries (centre shot, nock height, …; see
 * shared/setup-measures.ts), lengths in mm; who added it; the change it
 * logged when it differed from the last entry. Deleting the bow deletes them.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('setup_entries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    bow_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'bows', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    measure: {
      type: DataTypes.ENUM(
        'centre-shot',
        'nock-height',
        'brace-height',
        'axle-to-axle',
        'peep-height',
        'd-loop',
        'cam-timing',
        'cam-lean',
        'rest-kind',
        'cam-system',
      ),
      allowNull: false,
    },
    value_mm: { type: DataTypes.DOUBLE, allowNull: true },
    choice: { type: DataTypes.STRING(30), allowNull: true },
    measured_on: { type: DataTypes.DATEONLY, allowNull: false },
    note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    change_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'bow_changes', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('setup_entries');
}
