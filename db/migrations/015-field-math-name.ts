import type { QueryInterface } from "sequelize";

/**
 * Field math has one name in code, URLs and guide files: a step's in-step calculator is `fieldMath`
 * (it was `calc`). Saved guide versions are rewritten so every stored definition reads the same.
 */
export async function up(qi: QueryInterface) {
  await qi.sequelize.query(`UPDATE guide_versions SET definition = REPLACE(definition, '"calc":', '"fieldMath":') WHERE definition LIKE '%"calc":%'`);
}

export async function down(qi: QueryInterface) {
  await qi.sequelize.query(`UPDATE guide_versions SET definition = REPLACE(definition, '"fieldMath":', '"calc":') WHERE definition LIKE '%"fieldMath":%'`);
}
