using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace FilterQA.Migrations.Postgres.Migrations
{
    /// <summary>
    /// Written by hand on an empty dotnet-ef migration: the storage rules as PostgreSQL triggers, so
    /// that SQL which bypasses the DbContext (ExecuteUpdate, psql) cannot break them either.
    /// The errors use SQLSTATE 23001 (restrict_violation).
    /// </summary>
    public partial class StorageRuleTriggers : Migration
    {
        private static readonly string[] AppendOnlyTables = ["measurements", "rule_results", "audit_entries", "thru_references"];

        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("""
                CREATE FUNCTION filterqa_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
                BEGIN
                    RAISE EXCEPTION '% is append-only: % refused; store a new record that supersedes the row', TG_TABLE_NAME, TG_OP
                        USING ERRCODE = 'restrict_violation';
                END
                $$;
                """);
            foreach (string table in AppendOnlyTables)
            {
                migrationBuilder.Sql($"""
                    CREATE TRIGGER {table}_append_only BEFORE UPDATE OR DELETE ON {table}
                        FOR EACH ROW EXECUTE FUNCTION filterqa_append_only();
                    CREATE TRIGGER {table}_no_truncate BEFORE TRUNCATE ON {table}
                        FOR EACH STATEMENT EXECUTE FUNCTION filterqa_append_only();
                    """);
            }
            migrationBuilder.Sql("""
                CREATE FUNCTION filterqa_released_template_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
                BEGIN
                    IF TG_OP = 'DELETE' THEN
                        IF OLD."Status" <> 'Draft' THEN
                            RAISE EXCEPTION 'template revision % is %: it cannot be deleted', OLD."Id", OLD."Status"
                                USING ERRCODE = 'restrict_violation';
                        END IF;
                        RETURN OLD;
                    END IF;
                    IF OLD."Status" <> 'Draft' AND (
                        ROW(NEW."PartId", NEW."Revision", NEW."Text", NEW."ContentHash", NEW."DecisionRule", NEW."Author",
                            NEW."ReleaseDate", NEW."ReleasedAt", NEW."ReleasedBy", NEW."RegisteredAt", NEW."RegisteredBy")
                        IS DISTINCT FROM
                        ROW(OLD."PartId", OLD."Revision", OLD."Text", OLD."ContentHash", OLD."DecisionRule", OLD."Author",
                            OLD."ReleaseDate", OLD."ReleasedAt", OLD."ReleasedBy", OLD."RegisteredAt", OLD."RegisteredBy")
                        OR NOT (NEW."Status" = OLD."Status" OR (OLD."Status" = 'Released' AND NEW."Status" = 'Withdrawn'))) THEN
                        RAISE EXCEPTION 'template revision % is %: a released template revision cannot change (only Released -> Withdrawn is allowed)',
                            OLD."Id", OLD."Status" USING ERRCODE = 'restrict_violation';
                    END IF;
                    RETURN NEW;
                END
                $$;
                CREATE TRIGGER template_revisions_released_fixed BEFORE UPDATE OR DELETE ON template_revisions
                    FOR EACH ROW EXECUTE FUNCTION filterqa_released_template_fixed();
                """);
            migrationBuilder.Sql("""
                CREATE FUNCTION filterqa_lot_template_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
                BEGIN
                    IF NEW."TemplateRevisionId" <> OLD."TemplateRevisionId" AND EXISTS (SELECT 1 FROM units WHERE "LotId" = OLD."Id") THEN
                        RAISE EXCEPTION 'lot %: the template revision is fixed once its first unit is tested', OLD."LotNumber"
                            USING ERRCODE = 'restrict_violation';
                    END IF;
                    RETURN NEW;
                END
                $$;
                CREATE TRIGGER lots_template_fixed BEFORE UPDATE OF "TemplateRevisionId" ON lots
                    FOR EACH ROW EXECUTE FUNCTION filterqa_lot_template_fixed();
                """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            foreach (string table in AppendOnlyTables)
            {
                migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_append_only ON {table}; DROP TRIGGER IF EXISTS {table}_no_truncate ON {table};");
            }
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS template_revisions_released_fixed ON template_revisions;");
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS lots_template_fixed ON lots;");
            migrationBuilder.Sql("DROP FUNCTION IF EXISTS filterqa_append_only(); DROP FUNCTION IF EXISTS filterqa_released_template_fixed(); DROP FUNCTION IF EXISTS filterqa_lot_template_fixed();");
        }
    }
}
