using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class ReaderAndSourceIndexes : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            // IF EXISTS and IF NOT EXISTS: a database made by an interim build of this release may already lack the old
            // indexes, or hold the new ones or the four-column device-and-time index that build made.
            migrationBuilder.Sql("DROP INDEX IF EXISTS \"IX_trip_tests_device_order\";");
            migrationBuilder.Sql("DROP INDEX IF EXISTS \"IX_trip_tests_device_id_tested_at\";");

            migrationBuilder.Sql("DROP INDEX IF EXISTS \"IX_trip_tests_source_file_id\";");

            migrationBuilder.Sql("DROP INDEX IF EXISTS \"IX_insulation_tests_source_file_id\";");

            migrationBuilder.Sql("DROP INDEX IF EXISTS \"IX_contact_tests_source_file_id\";");

            migrationBuilder.Sql("CREATE INDEX IF NOT EXISTS \"IX_trip_tests_device\" ON \"trip_tests\" (\"device_id\");");

            migrationBuilder.Sql("CREATE INDEX IF NOT EXISTS \"IX_trip_tests_source\" ON \"trip_tests\" (\"source_file_id\", \"source_line\");");

            migrationBuilder.Sql("CREATE INDEX IF NOT EXISTS \"IX_insulation_tests_source\" ON \"insulation_tests\" (\"source_file_id\", \"source_line\");");

            migrationBuilder.Sql("CREATE INDEX IF NOT EXISTS \"IX_contact_tests_source\" ON \"contact_tests\" (\"source_file_id\", \"source_line\");");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_trip_tests_device",
                table: "trip_tests");

            migrationBuilder.DropIndex(
                name: "IX_trip_tests_source",
                table: "trip_tests");

            migrationBuilder.DropIndex(
                name: "IX_insulation_tests_source",
                table: "insulation_tests");

            migrationBuilder.DropIndex(
                name: "IX_contact_tests_source",
                table: "contact_tests");

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_device_id_tested_at",
                table: "trip_tests",
                columns: new[] { "device_id", "tested_at" });

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_source_file_id",
                table: "trip_tests",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_insulation_tests_source_file_id",
                table: "insulation_tests",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_contact_tests_source_file_id",
                table: "contact_tests",
                column: "source_file_id");
        }
    }
}
