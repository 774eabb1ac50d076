using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace TripTestLog.Migrations.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class ServerSchema : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "audit_changes",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    table_name = table.Column<string>(type: "text", nullable: false),
                    record_id = table.Column<long>(type: "bigint", nullable: false),
                    column_name = table.Column<string>(type: "text", nullable: false),
                    old_value = table.Column<string>(type: "text", nullable: false),
                    new_value = table.Column<string>(type: "text", nullable: false),
                    old_source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    new_source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    changed_at = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_audit_changes", x => x.id);
                });

            migrationBuilder.CreateTable(
                name: "source_files",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    file_name = table.Column<string>(type: "text", nullable: false),
                    full_path = table.Column<string>(type: "text", nullable: false),
                    sha256 = table.Column<string>(type: "text", nullable: false),
                    kind = table.Column<string>(type: "text", nullable: false),
                    rows_read = table.Column<long>(type: "bigint", nullable: false),
                    records_added = table.Column<long>(type: "bigint", nullable: false),
                    duplicates = table.Column<long>(type: "bigint", nullable: false),
                    imported_at = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_source_files", x => x.id);
                });

            migrationBuilder.CreateTable(
                name: "ambient_table_rows",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    table_name = table.Column<string>(type: "text", nullable: false),
                    ambient_c = table.Column<double>(type: "double precision", nullable: false),
                    current_factor = table.Column<double>(type: "double precision", nullable: false),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false)
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
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    table_name = table.Column<string>(type: "text", nullable: false),
                    multiple = table.Column<double>(type: "double precision", nullable: false),
                    min_s = table.Column<double>(type: "double precision", nullable: false),
                    max_s = table.Column<double>(type: "double precision", nullable: true),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false)
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

            migrationBuilder.CreateTable(
                name: "devices",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    asset_tag = table.Column<string>(type: "text", nullable: false, collation: "C"),
                    site = table.Column<string>(type: "text", nullable: false),
                    location = table.Column<string>(type: "text", nullable: false),
                    family = table.Column<string>(type: "text", nullable: false),
                    curve = table.Column<string>(type: "text", nullable: false),
                    rated_current_a = table.Column<double>(type: "double precision", nullable: false),
                    poles = table.Column<int>(type: "integer", nullable: false),
                    rated_voltage_v = table.Column<double>(type: "double precision", nullable: false),
                    commissioned_on = table.Column<DateTime>(type: "date", nullable: true),
                    contact_limit_uohm = table.Column<double>(type: "double precision", nullable: true),
                    make = table.Column<string>(type: "text", nullable: false),
                    model = table.Column<string>(type: "text", nullable: false),
                    serial = table.Column<string>(type: "text", nullable: false),
                    settings_json = table.Column<string>(type: "jsonb", nullable: false),
                    settings_from = table.Column<DateTime>(type: "date", nullable: true),
                    curve_table = table.Column<string>(type: "text", nullable: true),
                    reference_ambient_c = table.Column<double>(type: "double precision", nullable: true),
                    ambient_table = table.Column<string>(type: "text", nullable: true),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false)
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
                name: "instruments",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    instrument = table.Column<string>(type: "text", nullable: false),
                    kind = table.Column<string>(type: "text", nullable: false),
                    serial = table.Column<string>(type: "text", nullable: false),
                    calibrated_on = table.Column<DateTime>(type: "date", nullable: false),
                    calibration_due = table.Column<DateTime>(type: "date", nullable: false),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false),
                    fingerprint = table.Column<byte[]>(type: "bytea", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_instruments", x => x.id);
                    table.ForeignKey(
                        name: "FK_instruments_source_files_source_file_id",
                        column: x => x.source_file_id,
                        principalTable: "source_files",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "contact_tests",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    device_id = table.Column<long>(type: "bigint", nullable: false),
                    tested_at = table.Column<DateTime>(type: "timestamp without time zone", nullable: false),
                    stage = table.Column<string>(type: "text", nullable: false),
                    pole = table.Column<string>(type: "text", nullable: false),
                    resistance_uohm = table.Column<double>(type: "double precision", nullable: false),
                    test_current_a = table.Column<double>(type: "double precision", nullable: false),
                    temperature_c = table.Column<double>(type: "double precision", nullable: true),
                    instrument = table.Column<string>(type: "text", nullable: false),
                    technician = table.Column<string>(type: "text", nullable: false),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false),
                    fingerprint = table.Column<byte[]>(type: "bytea", nullable: false),
                    tested_has_time = table.Column<bool>(type: "boolean", nullable: false),
                    tested_offset_min = table.Column<short>(type: "smallint", nullable: true)
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
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    device_id = table.Column<long>(type: "bigint", nullable: false),
                    site = table.Column<string>(type: "text", nullable: false),
                    location = table.Column<string>(type: "text", nullable: false),
                    family = table.Column<string>(type: "text", nullable: false),
                    curve = table.Column<string>(type: "text", nullable: false),
                    rated_current_a = table.Column<double>(type: "double precision", nullable: false),
                    poles = table.Column<int>(type: "integer", nullable: false),
                    rated_voltage_v = table.Column<double>(type: "double precision", nullable: false),
                    commissioned_on = table.Column<DateTime>(type: "date", nullable: true),
                    contact_limit_uohm = table.Column<double>(type: "double precision", nullable: true),
                    make = table.Column<string>(type: "text", nullable: false),
                    model = table.Column<string>(type: "text", nullable: false),
                    serial = table.Column<string>(type: "text", nullable: false),
                    settings_json = table.Column<string>(type: "jsonb", nullable: false),
                    settings_from = table.Column<DateTime>(type: "date", nullable: true),
                    curve_table = table.Column<string>(type: "text", nullable: true),
                    reference_ambient_c = table.Column<double>(type: "double precision", nullable: true),
                    ambient_table = table.Column<string>(type: "text", nullable: true),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false),
                    recorded_at = table.Column<DateTimeOffset>(type: "timestamp with time zone", nullable: false)
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
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    device_id = table.Column<long>(type: "bigint", nullable: false),
                    tested_at = table.Column<DateTime>(type: "timestamp without time zone", nullable: false),
                    stage = table.Column<string>(type: "text", nullable: false),
                    path = table.Column<string>(type: "text", nullable: false),
                    test_voltage_v = table.Column<double>(type: "double precision", nullable: false),
                    resistance_mohm = table.Column<double>(type: "double precision", nullable: false),
                    over_range = table.Column<bool>(type: "boolean", nullable: false),
                    temperature_c = table.Column<double>(type: "double precision", nullable: true),
                    duration_s = table.Column<double>(type: "double precision", nullable: true),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false),
                    fingerprint = table.Column<byte[]>(type: "bytea", nullable: false),
                    tested_has_time = table.Column<bool>(type: "boolean", nullable: false),
                    tested_offset_min = table.Column<short>(type: "smallint", nullable: true)
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
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    device_id = table.Column<long>(type: "bigint", nullable: false),
                    tested_at = table.Column<DateTime>(type: "timestamp without time zone", nullable: false),
                    stage = table.Column<string>(type: "text", nullable: false),
                    pole = table.Column<string>(type: "text", nullable: false),
                    current_a = table.Column<double>(type: "double precision", nullable: false),
                    tripped = table.Column<bool>(type: "boolean", nullable: false),
                    time_s = table.Column<double>(type: "double precision", nullable: false),
                    start = table.Column<string>(type: "text", nullable: false),
                    ambient_c = table.Column<double>(type: "double precision", nullable: true),
                    instrument = table.Column<string>(type: "text", nullable: false),
                    technician = table.Column<string>(type: "text", nullable: false),
                    note = table.Column<string>(type: "text", nullable: false),
                    found_ir_a = table.Column<double>(type: "double precision", nullable: true),
                    found_isd_a = table.Column<double>(type: "double precision", nullable: true),
                    found_ii_a = table.Column<double>(type: "double precision", nullable: true),
                    found_im_a = table.Column<double>(type: "double precision", nullable: true),
                    found_pickup_a = table.Column<double>(type: "double precision", nullable: true),
                    found_tms = table.Column<double>(type: "double precision", nullable: true),
                    source_file_id = table.Column<long>(type: "bigint", nullable: false),
                    source_line = table.Column<long>(type: "bigint", nullable: false),
                    fingerprint = table.Column<byte[]>(type: "bytea", nullable: false),
                    tested_has_time = table.Column<bool>(type: "boolean", nullable: false),
                    tested_offset_min = table.Column<short>(type: "smallint", nullable: true)
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
                name: "IX_ambient_table_rows_source_file_id",
                table: "ambient_table_rows",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_ambient_table_rows_table_name",
                table: "ambient_table_rows",
                column: "table_name");

            migrationBuilder.CreateIndex(
                name: "IX_audit_changes_table_name_record_id",
                table: "audit_changes",
                columns: new[] { "table_name", "record_id" });

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
                name: "IX_contact_tests_source",
                table: "contact_tests",
                columns: new[] { "source_file_id", "source_line" });

            migrationBuilder.CreateIndex(
                name: "IX_curve_table_rows_source_file_id",
                table: "curve_table_rows",
                column: "source_file_id");

            migrationBuilder.CreateIndex(
                name: "IX_curve_table_rows_table_name",
                table: "curve_table_rows",
                column: "table_name");

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
                name: "IX_instruments_fingerprint",
                table: "instruments",
                column: "fingerprint",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_instruments_instrument",
                table: "instruments",
                column: "instrument");

            migrationBuilder.CreateIndex(
                name: "IX_instruments_source_file_id",
                table: "instruments",
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
                name: "IX_insulation_tests_source",
                table: "insulation_tests",
                columns: new[] { "source_file_id", "source_line" });

            migrationBuilder.CreateIndex(
                name: "IX_source_files_sha256",
                table: "source_files",
                column: "sha256",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_device",
                table: "trip_tests",
                column: "device_id");

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_fingerprint",
                table: "trip_tests",
                column: "fingerprint",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_trip_tests_source",
                table: "trip_tests",
                columns: new[] { "source_file_id", "source_line" });

            // One device whatever the case of A to Z (the AssetTag rule, as SQLite's NOCASE): the tag lookups match on this key.
            migrationBuilder.Sql(
                "CREATE UNIQUE INDEX \"IX_devices_tag_key\" ON devices (translate(asset_tag, 'ABCDEFGHIJKLMNOPQRSTUVWXYZ', 'abcdefghijklmnopqrstuvwxyz'));");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("DROP INDEX \"IX_devices_tag_key\";");
            migrationBuilder.DropTable(
                name: "ambient_table_rows");

            migrationBuilder.DropTable(
                name: "audit_changes");

            migrationBuilder.DropTable(
                name: "contact_tests");

            migrationBuilder.DropTable(
                name: "curve_table_rows");

            migrationBuilder.DropTable(
                name: "device_revisions");

            migrationBuilder.DropTable(
                name: "instruments");

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
