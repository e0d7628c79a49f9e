import type { Knex } from "knex";

const VERDICTS = "('within','marginal','outside','unbanded','missing')";

export async function up(knex: Knex): Promise<void> {
  // One solver build, identified by its commit; re-posts update it in place.
  await knex.schema.createTable("builds", (t) => {
    t.bigIncrements("id");
    t.text("solver").notNullable();
    t.text("version").notNullable();
    t.text("commit").notNullable().unique();
    t.text("branch").notNullable();
    t.text("pipeline_url");
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("verdict").notNullable().defaultTo("missing");
    t.check(`verdict in ${VERDICTS}`, [], "builds_verdict_check");
  });
  await knex.raw("create index builds_branch_received_idx on builds (branch, received_at desc, id desc)");
  await knex.raw("create index builds_received_idx on builds (received_at desc, id desc)");

  // Each CI post: who sent it, how big, what it touched (raw data lives in the run tables).
  await knex.schema.createTable("submissions", (t) => {
    t.bigIncrements("id");
    t.bigInteger("build_id").notNullable().references("builds.id").onDelete("CASCADE");
    t.bigInteger("ci_token_id").references("ci_tokens.id").onDelete("SET NULL");
    t.bigInteger("user_id").references("users.id").onDelete("SET NULL");
    t.integer("run_count").notNullable();
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("create index submissions_build_idx on submissions (build_id)");

  // One case x model x grid inside one build.
  await knex.schema.createTable("runs", (t) => {
    t.bigIncrements("id");
    t.bigInteger("build_id").notNullable().references("builds.id").onDelete("CASCADE");
    t.text("case_key").notNullable().references("cases.key");
    t.text("model_key").notNullable().references("models.key");
    t.text("grid").notNullable().defaultTo("default");
    t.text("status").notNullable();
    t.integer("iterations");
    t.double("wall_seconds");
    t.text("verdict").notNullable();
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["build_id", "case_key", "model_key", "grid"]);
    t.check("status in ('COMPLETED','DIVERGED','CRASHED','TIMEOUT')", [], "runs_status_check");
    t.check(`verdict in ${VERDICTS}`, [], "runs_verdict_check");
    t.check("iterations is null or iterations >= 0", [], "runs_iterations_check");
    t.check("wall_seconds is null or wall_seconds >= 0", [], "runs_wall_seconds_check");
    t.check("length(grid) > 0", [], "runs_grid_check");
  });

  // A profile or history a run reported (u_plus, k_decay, cf, residual, ...).
  await knex.schema.createTable("run_series", (t) => {
    t.bigIncrements("id");
    t.bigInteger("run_id").notNullable().references("runs.id").onDelete("CASCADE");
    t.text("key").notNullable();
    t.specificType("x", "float8[]").notNullable();
    t.specificType("y", "float8[]").notNullable();
    t.unique(["run_id", "key"]);
    t.check("cardinality(x) = cardinality(y) and cardinality(x) > 0", [], "run_series_length_check");
  });

  // Reynolds-stress samples with the invariants derived from them.
  await knex.schema.createTable("stress_samples", (t) => {
    t.bigIncrements("id");
    t.bigInteger("run_id").notNullable().references("runs.id").onDelete("CASCADE");
    t.integer("idx").notNullable();
    t.double("at").notNullable();
    for (const c of ["uu", "vv", "ww", "uv", "uw", "vw"]) t.double(c).notNullable();
    t.double("k");
    t.double("ii");
    t.double("iii");
    t.double("eta");
    t.double("xi");
    t.double("lumley_f");
    t.double("bary_x");
    t.double("bary_y");
    t.boolean("realizable").notNullable();
    t.specificType("violations", "text[]").notNullable().defaultTo("{}");
    t.unique(["run_id", "idx"]);
  });

  // A three-grid study (fine to coarse) and its Celik et al. (2008) results.
  await knex.schema.createTable("grid_studies", (t) => {
    t.bigInteger("run_id").primary().references("runs.id").onDelete("CASCADE");
    t.text("quantity").notNullable();
    t.specificType("cells", "float8[]").notNullable();
    t.specificType("values", "float8[]").notNullable();
    t.integer("dimension").notNullable();
    t.text("convergence").notNullable();
    t.double("observed_order");
    t.double("extrapolated_value");
    t.double("gci_fine_pct");
    t.double("ea_pct");
    t.double("eext_pct");
    t.check("dimension in (1,2,3)", [], "grid_studies_dimension_check");
    t.check("cardinality(cells) = 3 and cardinality(values) = 3", [], "grid_studies_triple_check");
  });

  // Closure coefficients a run was computed with (to spot a changed constant).
  await knex.schema.createTable("run_coefficients", (t) => {
    t.bigInteger("run_id").notNullable().references("runs.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.double("value").notNullable();
    t.primary(["run_id", "name"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["run_coefficients", "grid_studies", "stress_samples", "run_series", "runs", "submissions", "builds"]) {
    await knex.schema.dropTable(table);
  }
}
