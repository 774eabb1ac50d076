using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class InstrumentsAndAudit : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "audit_changes",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    table_name = table.Column<string>(type: "TEXT", nullable: false),
                    record_id = table.Column<long>(type: "INTEGER", nullable: false),
                    column_name = table.Column<string>(type: "TEXT", nullable: false),
                    old_value = table.Column<string>(type: "TEXT", nullable: false),
                    new_value = table.Column<string>(type: "TEXT", nullable: false),
                    old_source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    new_source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    changed_at = table.Column<string>(type: "TEXT", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_audit_changes", x => x.id);
                });

            migrationBuilder.CreateTable(
                name: "instruments",
                columns: table => new
                {
                    id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    instrument = table.Column<string>(type: "TEXT", nullable: false),
                    kind = table.Column<string>(type: "TEXT", nullable: false),
                    serial = table.Column<string>(type: "TEXT", nullable: false),
                    calibrated_on = table.Column<string>(type: "TEXT", nullable: false),
                    calibration_due = table.Column<string>(type: "TEXT", nullable: false),
                    source_file_id = table.Column<long>(type: "INTEGER", nullable: false),
                    source_line = table.Column<long>(type: "INTEGER", nullable: false),
                    fingerprint = table.Column<string>(type: "TEXT", nullable: false)
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

            migrationBuilder.CreateIndex(
                name: "IX_audit_changes_table_name_record_id",
                table: "audit_changes",
                columns: new[] { "table_name", "record_id" });

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
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "audit_changes");

            migrationBuilder.DropTable(
                name: "instruments");
        }
    }
}
