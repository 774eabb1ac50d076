using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class InitialSchema : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "source_files",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    file_name = table.Column<string>(type: "TEXT", nullable: false),
                    sha256 = table.Column<string>(type: "TEXT", nullable: false),
                    kind = table.Column<string>(type: "TEXT", nullable: false),
                    rows_read = table.Column<long>(type: "INTEGER", nullable: false),
                    records_added = table.Column<long>(type: "INTEGER", nullable: false),
                    duplicates = table.Column<long>(type: "INTEGER", nullable: false),
                    imported_at = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_source_files", x => x.id);
                });

            migrationBuilder.CreateTable(
                name: "devices",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    asset_tag = table.Column<string>(type: "TEXT", nullable: false),
                    site = table.Column<string>(type: "TEXT", nullable: false),
                    location = table.Column<string>(type: "TEXT", nullable: false),
                    family = table.Column<string>(type: "TEXT", nullable: false),
                    curve = table.Column<string>(type: "TEXT", nullable: false),
                    rated_current_a = table.Column<double>(type: "REAL", nullable: false),
                    poles = table.Column<int>(type: "INTEGER", nullable: false),
                    rated_voltage_v = table.Column<double>(type: "REAL", nullable: false),
                    commissioned_on = table.Column<string>(type: "TEXT", nullable: true),
                    contact_limit_uohm = table.Column<double>(type: "REAL", nullable: true),
                    make = table.Column<string>(type: "TEXT", nullable: false),
                    model = table.Column<string>(type: "TEXT", nullable: false),
                    serial = table.Column<string>(type: "TEXT", nullable: false),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_devices", x => x.id);
                    table.ForeignKey(
                        name: "FK_devices_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "contact_tests",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    device_id = table.Column<long>(type: "INTEGER", nullable: false),
                    tested_at = table.Column<string>(type: "TEXT", nullable: false),
                    stage = table.Column<string>(type: "TEXT", nullable: false),
                    pole = table.Column<string>(type: "TEXT", nullable: false),
                    resistance_uohm = table.Column<double>(type: "REAL", nullable: false),
                    test_current_a = table.Column<double>(type: "REAL", nullable: false),
                    temperature_c = table.Column<double>(type: "REAL", nullable: true),
                    instrument = table.Column<string>(type: "TEXT", nullable: false),
                    technician = table.Column<string>(type: "TEXT", nullable: false),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false),
                    fingerprint = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_contact_tests", x => x.id);
                    table.ForeignKey(
                        name: "FK_contact_tests_devices_device_id",
                        column: x => x.device_id,
                        principalTable: "devices",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_contact_tests_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "device_revisions",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    device_id = table.Column<long>(type: "INTEGER", nullable: false),
                    site = table.Column<string>(type: "TEXT", nullable: false),
                    location = table.Column<string>(type: "TEXT", nullable: false),
                    family = table.Column<string>(type: "TEXT", nullable: false),
                    curve = table.Column<string>(type: "TEXT", nullable: false),
                    rated_current_a = table.Column<double>(type: "REAL", nullable: false),
                    poles = table.Column<int>(type: "INTEGER", nullable: false),
                    rated_voltage_v = table.Column<double>(type: "REAL", nullable: false),
                    commissioned_on = table.Column<string>(type: "TEXT", nullable: true),
                    contact_limit_uohm = table.Column<double>(type: "REAL", nullable: true),
                    make = table.Column<string>(type: "TEXT", nullable: false),
                    model = table.Column<string>(type: "TEXT", nullable: false),
                    serial = table.Column<string>(type: "TEXT", nullable: false),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false),
                    recorded_at = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_device_revisions", x => x.id);
                    table.ForeignKey(
                        name: "FK_device_revisions_devices_device_id",
                        column: x => x.device_id,
                        principalTable: "devices",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_device_revisions_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "insulation_tests",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    device_id = table.Column<long>(type: "INTEGER", nullable: false),
                    tested_at = table.Column<string>(type: "TEXT", nullable: false),
                    stage = table.Column<string>(type: "TEXT", nullable: false),
                    path = table.Column<string>(type: "TEXT", nullable: false),
                    test_voltage_v = table.Column<double>(type: "REAL", nullable: false),
                    resistance_mohm = table.Column<double>(type: "REAL", nullable: false),
                    over_range = table.Column<bool>(type: "INTEGER", nullable: false),
                    temperature_c = table.Column<double>(type: "REAL", nullable: true),
                    duration_s = table.Column<double>(type: "REAL", nullable: true),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false),
                    fingerprint = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_insulation_tests", x => x.id);
                    table.ForeignKey(
                        name: "FK_insulation_tests_devices_device_id",
                        column: x => x.device_id,
                        principalTable: "devices",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_insulation_tests_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "trip_tests",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    device_id = table.Column<long>(type: "INTEGER", nullable: false),
                    tested_at = table.Column<string>(type: "TEXT", nullable: false),
                    stage = table.Column<string>(type: "TEXT", nullable: false),
                    pole = table.Column<string>(type: "TEXT", nullable: false),
                    current_a = table.Column<double>(type: "REAL", nullable: false),
                    tripped = table.Column<bool>(type: "INTEGER", nullable: false),
                    time_s = table.Column<double>(type: "REAL", nullable: false),
                    start = table.Column<string>(type: "TEXT", nullable: false),
                    ambient_c = table.Column<double>(type: "REAL", nullable: true),
                    instrument = table.Column<string>(type: "TEXT", nullable: false),
                    technician = table.Column<string>(type: "TEXT", nullable: false),
                    note = table.Column<string>(type: "TEXT", nullable: false),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false),
                    fingerprint = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_trip_tests", x => x.id);
                    table.ForeignKey(
                        name: "FK_trip_tests_devices_device_id",
                        column: x => x.device_id,
                        principalTable: "devices",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_trip_tests_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateIndex(
                name: "IX_contact_tests_device_id_tested_at",
                table: "contact_tests",
                columns: new[] { "device_id", "tested_at" });

            migrationBuilder.CreateIndex(
                name: "IX_contact_tests_fingerprint",
                table: "contact_tests",
                column: "fingerprint",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_contact_tests_source_file_id",
                table: "contact_tests",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_device_revisions_device_id",
                table: "device_revisions",
                column: "device_id");

            migrationBuilder.CreateIndex(
                name: "IX_device_revisions_source_file_id",
                table: "device_revisions",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_devices_asset_tag",
                table: "devices",
                column: "asset_tag",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_devices_source_file_id",
                table: "devices",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_insulation_tests_device_id_tested_at",
                table: "insulation_tests",
                columns: new[] { "device_id", "tested_at" });

            migrationBuilder.CreateIndex(
                name: "IX_insulation_tests_fingerprint",
                table: "insulation_tests",
                column: "fingerprint",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_insulation_tests_source_file_id",
                table: "insulation_tests",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_source_files_sha256",
                table: "source_files",
                column: "sha256",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_device_id_tested_at",
                table: "trip_tests",
                columns: new[] { "device_id", "tested_at" });

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_fingerprint",
                table: "trip_tests",
                column: "fingerprint",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_source_file_id",
                table: "trip_tests",
                column: "source_file_id");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "contact_tests");

            migrationBuilder.DropTable(
                name: "device_revisions");

            migrationBuilder.DropTable(
                name: "insulation_tests");

            migrationBuilder.DropTable(
                name: "trip_tests");

            migrationBuilder.DropTable(
                name: "devices");

            migrationBuilder.DropTable(
                name: "source_files");
        }
    }
}
