using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace FilterQA.Migrations.Sqlite.Migrations
{
    /// <inheritdoc />
    public partial class ReferenceUnits : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "ReleaseReason",
                table: "template_revisions",
                type: "TEXT",
                maxLength: 2000,
                nullable: true);

            migrationBuilder.CreateTable(
                name: "reference_units",
                columns: table => new
                {
                    Id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    PartId = table.Column<long>(type: "INTEGER", nullable: false),
                    MeasurementId = table.Column<long>(type: "INTEGER", nullable: false),
                    Note = table.Column<string>(type: "TEXT", maxLength: 2000, nullable: false),
                    MarkedAt = table.Column<long>(type: "INTEGER", nullable: false),
                    MarkedById = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    MarkedBy = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    RemovedAt = table.Column<long>(type: "INTEGER", nullable: true),
                    RemovedBy = table.Column<string>(type: "TEXT", maxLength: 200, nullable: true),
                    RemovalNote = table.Column<string>(type: "TEXT", maxLength: 2000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_reference_units", x => x.Id);
                    table.ForeignKey(
                        name: "FK_reference_units_measurements_MeasurementId",
                        column: x => x.MeasurementId,
                        principalTable: "measurements",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_reference_units_parts_PartId",
                        column: x => x.PartId,
                        principalTable: "parts",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateIndex(
                name: "IX_reference_units_MeasurementId",
                table: "reference_units",
                column: "MeasurementId",
                unique: true,
                filter: "\"RemovedAt\" IS NULL");

            migrationBuilder.CreateIndex(
                name: "IX_reference_units_PartId",
                table: "reference_units",
                column: "PartId");

            // The reason a revision was released is part of its record: fixed once released, like its text.
            migrationBuilder.Sql("""
                CREATE TRIGGER template_revisions_release_reason_fixed BEFORE UPDATE OF "ReleaseReason" ON template_revisions
                WHEN OLD."Status" <> 'Draft' AND NEW."ReleaseReason" IS NOT OLD."ReleaseReason"
                BEGIN
                    SELECT RAISE(ABORT, 'the release reason of a released template revision cannot change');
                END;
                """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS template_revisions_release_reason_fixed;");
            migrationBuilder.DropTable(
                name: "reference_units");

            migrationBuilder.DropColumn(
                name: "ReleaseReason",
                table: "template_revisions");
        }
    }
}
