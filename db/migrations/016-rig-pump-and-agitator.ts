import { DataTypes, type QueryInterface } from "sequelize";

/**
 * What the guides and field math need to know about a rig's pump and agitator: the pump's rated
 * flow and pressure and how much suction it needs (from its curve), which way the agitator mixes
 * (rigs differ, and the stall guide must name this rig's directions), and what the carrier is
 * rated to carry. All but the mixing direction may be unknown (null) until someone looks them up.
 */
export async function up(qi: QueryInterface) {
  await qi.addColumn("rigs", "agitator_mixes", { type: DataTypes.ENUM("forward", "reverse"), allowNull: false, defaultValue: "forward" });
  await qi.addColumn("rigs", "pump_rated_gpm", { type: DataTypes.DECIMAL(6, 1), allowNull: true });
  await qi.addColumn("rigs", "pump_rated_psi", { type: DataTypes.DECIMAL(5, 1), allowNull: true });
  await qi.addColumn("rigs", "pump_npshr_ft", { type: DataTypes.DECIMAL(4, 1), allowNull: true });
  await qi.addColumn("rigs", "carrier_rating_lb", { type: DataTypes.INTEGER.UNSIGNED, allowNull: true });
}

export async function down(qi: QueryInterface) {
  for (const c of ["agitator_mixes", "pump_rated_gpm", "pump_rated_psi", "pump_npshr_ft", "carrier_rating_lb"]) await qi.removeColumn("rigs", c);
}
