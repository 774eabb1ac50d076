using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class TripDeviceOrder : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_trip_tests_device_id_tested_at",
                table: "trip_tests");

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_device_order",
                table: "trip_tests",
                columns: new[] { "device_id", "tested_at", "source_file_id", "source_line" });
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_trip_tests_device_order",
                table: "trip_tests");

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_device_id_tested_at",
                table: "trip_tests",
                columns: new[] { "device_id", "tested_at" });
        }
    }
}
