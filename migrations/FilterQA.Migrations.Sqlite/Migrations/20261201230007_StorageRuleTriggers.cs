using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace FilterQA.Migrations.Sqlite.Migrations
{
    /// <summary>
    /// Written by hand on an empty dotnet-ef migration: the storage rules as SQLite triggers, so
    /// that SQL which bypasses the DbContext (ExecuteUpdate, a console) cannot break them either.
    /// RAISE(ABORT) rolls back the statement and reports SQLITE_CONSTRAINT with the message.
    /// </summary>
    public partial class StorageRuleTriggers : Migration
    {
        private static readonly string[] AppendOnlyTables = ["measurements", "rule_results", "audit_entries", "thru_references"];

        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            foreach (string table in AppendOnlyTables)
            {
                foreach (string operation in new[] { "UPDATE", "DELETE" })
                {
                    migrationBuilder.Sql($"""
                        CREATE TRIGGER {table}_append_only_{operation.ToLowerInvariant()} BEFORE {operation} ON {table}
                        BEGIN
                            SELECT RAISE(ABORT, '{table} is append-only: {operation} refused; store a new record that supersedes the row');
                        END;
                        """);
                }
            }
            migrationBuilder.Sql("""
                CREATE TRIGGER template_revisions_released_fixed BEFORE UPDATE ON template_revisions
                WHEN OLD."Status" <> 'Draft' AND (
                    NEW."PartId" IS NOT OLD."PartId" OR NEW."Revision" IS NOT OLD."Revision"
                    OR NEW."Text" IS NOT OLD."Text" OR NEW."ContentHash" IS NOT OLD."ContentHash"
                    OR NEW."DecisionRule" IS NOT OLD."DecisionRule" OR NEW."Author" IS NOT OLD."Author"
                    OR NEW."ReleaseDate" IS NOT OLD."ReleaseDate" OR NEW."ReleasedAt" IS NOT OLD."ReleasedAt"
                    OR NEW."ReleasedBy" IS NOT OLD."ReleasedBy" OR NEW."RegisteredAt" IS NOT OLD."RegisteredAt"
                    OR NEW."RegisteredBy" IS NOT OLD."RegisteredBy"
                    OR NOT (NEW."Status" = OLD."Status" OR (OLD."Status" = 'Released' AND NEW."Status" = 'Withdrawn')))
                BEGIN
                    SELECT RAISE(ABORT, 'a released template revision cannot change (only Released -> Withdrawn is allowed)');
                END;
                """);
            migrationBuilder.Sql("""
                CREATE TRIGGER template_revisions_released_kept BEFORE DELETE ON template_revisions
                WHEN OLD."Status" <> 'Draft'
                BEGIN
                    SELECT RAISE(ABORT, 'a released template revision cannot be deleted');
                END;
                """);
            migrationBuilder.Sql("""
                CREATE TRIGGER lots_template_fixed BEFORE UPDATE OF "TemplateRevisionId" ON lots
                WHEN NEW."TemplateRevisionId" <> OLD."TemplateRevisionId" AND EXISTS (SELECT 1 FROM units WHERE "LotId" = OLD."Id")
                BEGIN
                    SELECT RAISE(ABORT, 'the template revision of a lot is fixed once its first unit is tested');
                END;
                """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            foreach (string table in AppendOnlyTables)
            {
                migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_append_only_update;");
                migrationBuilder.Sql($"DROP TRIGGER IF EXISTS {table}_append_only_delete;");
            }
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS template_revisions_released_fixed;");
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS template_revisions_released_kept;");
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS lots_template_fixed;");
        }
    }
}
