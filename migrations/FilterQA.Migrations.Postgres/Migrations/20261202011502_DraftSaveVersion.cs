using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace FilterQA.Migrations.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class DraftSaveVersion : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<DateTimeOffset>(
                name: "DraftSavedAt",
                table: "template_revisions",
                type: "timestamp with time zone",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "DraftSavedBy",
                table: "template_revisions",
                type: "character varying(200)",
                maxLength: 200,
                nullable: true);

            migrationBuilder.AddColumn<int>(
                name: "DraftVersion",
                table: "template_revisions",
                type: "integer",
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
