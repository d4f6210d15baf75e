import { DataTypes, type QueryInterface } from 'sequelize';

/** One row per journeyworker and day a review digest went out, so no instance sends it twice. */
export async function up({ context: q }: { context: QueryInterface }) {
	await q.createTable('review_digests', {
		supervisor_id: {
			type: DataTypes.STRING(40),
			allowNull: false,
			primaryKey: true,
			references: { model: 'users', key: 'id' },
			onDelete: 'CASCADE'
		},
		day: { type: DataTypes.DATEONLY, allowNull: false, primaryKey: true },
		waiting: { type: DataTypes.INTEGER, allowNull: false },
		sent_at: { type: DataTypes.DATE, allowNull: false }
	});
}

export async function down({ context: q }: { context: QueryInterface }) {
	await q.dropTable('review_digests');
}
