using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class InstrumentAccuracy : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<double>(
                name: "coverage_factor",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "current_accuracy_a",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "current_accuracy_pct",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "insulation_accuracy_pct",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "resistance_accuracy_pct",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "resistance_accuracy_uohm",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "time_accuracy_pct",
                table: "instruments",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "time_accuracy_s",
                table: "instruments",
                type: "REAL",
                nullable: true);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "coverage_factor",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "current_accuracy_a",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "current_accuracy_pct",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "insulation_accuracy_pct",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "resistance_accuracy_pct",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "resistance_accuracy_uohm",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "time_accuracy_pct",
                table: "instruments");

            migrationBuilder.DropColumn(
                name: "time_accuracy_s",
                table: "instruments");
        }
    }
}
