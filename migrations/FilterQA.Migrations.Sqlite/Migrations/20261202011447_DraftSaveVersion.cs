using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace FilterQA.Migrations.Sqlite.Migrations
{
    /// <inheritdoc />
    public partial class DraftSaveVersion : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<long>(
                name: "DraftSavedAt",
                table: "template_revisions",
                type: "INTEGER",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "DraftSavedBy",
                table: "template_revisions",
                type: "TEXT",
                maxLength: 200,
                nullable: true);

            migrationBuilder.AddColumn<int>(
                name: "DraftVersion",
                table: "template_revisions",
                type: "INTEGER",
                nullable: false,
                defaultValue: 1);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "DraftSavedAt",
                table: "template_revisions");

            migrationBuilder.DropColumn(
                name: "DraftSavedBy",
                table: "template_revisions");

            migrationBuilder.DropColumn(
                name: "DraftVersion",
                table: "template_revisions");
        }
    }
}
