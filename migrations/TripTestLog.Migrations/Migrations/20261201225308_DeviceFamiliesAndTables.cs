using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class DeviceFamiliesAndTables : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<double>(
                name: "found_ii_a",
                table: "trip_tests",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "found_im_a",
                table: "trip_tests",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "found_ir_a",
                table: "trip_tests",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "found_isd_a",
                table: "trip_tests",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "found_pickup_a",
                table: "trip_tests",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "found_tms",
                table: "trip_tests",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "ambient_table",
                table: "devices",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "curve_table",
                table: "devices",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "reference_ambient_c",
                table: "devices",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "settings_from",
                table: "devices",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "settings_json",
                table: "devices",
                type: "TEXT",
                nullable: false,
                defaultValue: "");

            migrationBuilder.AddColumn<string>(
                name: "ambient_table",
                table: "device_revisions",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "curve_table",
                table: "device_revisions",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<double>(
                name: "reference_ambient_c",
                table: "device_revisions",
                type: "REAL",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "settings_from",
                table: "device_revisions",
                type: "TEXT",
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "settings_json",
                table: "device_revisions",
                type: "TEXT",
                nullable: false,
                defaultValue: "");

            migrationBuilder.CreateTable(
                name: "ambient_table_rows",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    table_name = table.Column<string>(type: "TEXT", nullable: false),
                    ambient_c = table.Column<double>(type: "REAL", nullable: false),
                    current_factor = table.Column<double>(type: "REAL", nullable: false),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ambient_table_rows", x => x.id);
                    table.ForeignKey(
                        name: "FK_ambient_table_rows_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "curve_table_rows",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    table_name = table.Column<string>(type: "TEXT", nullable: false),
                    multiple = table.Column<double>(type: "REAL", nullable: false),
                    min_s = table.Column<double>(type: "REAL", nullable: false),
                    max_s = table.Column<double>(type: "REAL", nullable: true),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_curve_table_rows", x => x.id);
                    table.ForeignKey(
                        name: "FK_curve_table_rows_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateIndex(
                name: "IX_ambient_table_rows_source_file_id",
                table: "ambient_table_rows",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_ambient_table_rows_table_name",
                table: "ambient_table_rows",
                column: "table_name");

            migrationBuilder.CreateIndex(
                name: "IX_curve_table_rows_source_file_id",
                table: "curve_table_rows",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_curve_table_rows_table_name",
                table: "curve_table_rows",
                column: "table_name");

            // Schema 1 knew only IEC 60898-1 devices, with the curve in its own column: carry it into the settings.
            migrationBuilder.Sql("UPDATE devices SET settings_json = json_object('kind', 'iec60898', 'curve', curve) WHERE settings_json = '';");
            migrationBuilder.Sql("UPDATE device_revisions SET settings_json = json_object('kind', 'iec60898', 'curve', curve) WHERE settings_json = '';");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "ambient_table_rows");

            migrationBuilder.DropTable(
                name: "curve_table_rows");

            migrationBuilder.DropColumn(
                name: "found_ii_a",
                table: "trip_tests");

            migrationBuilder.DropColumn(
                name: "found_im_a",
                table: "trip_tests");

            migrationBuilder.DropColumn(
                name: "found_ir_a",
                table: "trip_tests");

            migrationBuilder.DropColumn(
                name: "found_isd_a",
                table: "trip_tests");

            migrationBuilder.DropColumn(
                name: "found_pickup_a",
                table: "trip_tests");

            migrationBuilder.DropColumn(
                name: "found_tms",
                table: "trip_tests");

            migrationBuilder.DropColumn(
                name: "ambient_table",
                table: "devices");

            migrationBuilder.DropColumn(
                name: "curve_table",
                table: "devices");

            migrationBuilder.DropColumn(
                name: "reference_ambient_c",
                table: "devices");

            migrationBuilder.DropColumn(
                name: "settings_from",
                table: "devices");

            migrationBuilder.DropColumn(
                name: "settings_json",
                table: "devices");

            migrationBuilder.DropColumn(
                name: "ambient_table",
                table: "device_revisions");

            migrationBuilder.DropColumn(
                name: "curve_table",
                table: "device_revisions");

            migrationBuilder.DropColumn(
                name: "reference_ambient_c",
                table: "device_revisions");

            migrationBuilder.DropColumn(
                name: "settings_from",
                table: "device_revisions");

            migrationBuilder.DropColumn(
                name: "settings_json",
                table: "device_revisions");
        }
    }
}
