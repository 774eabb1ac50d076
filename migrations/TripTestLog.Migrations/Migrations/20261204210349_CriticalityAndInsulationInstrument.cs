using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class CriticalityAndInsulationInstrument : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "instrument",
                table: "insulation_tests",
                type: "TEXT",
                nullable: false,
                defaultValue: "");

            migrationBuilder.AddColumn<int>(
                name: "criticality",
                table: "devices",
                type: "INTEGER",
                nullable: false,
                defaultValue: 2);

            migrationBuilder.AddColumn<int>(
                name: "criticality",
                table: "device_revisions",
                type: "INTEGER",
                nullable: false,
                defaultValue: 2);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "instrument",
                table: "insulation_tests");

            migrationBuilder.DropColumn(
                name: "criticality",
                table: "devices");

            migrationBuilder.DropColumn(
                name: "criticality",
                table: "device_revisions");
        }
    }
}
