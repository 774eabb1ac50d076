using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class RecordKindCodes : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            // The kind of each imported file is kept as its code (trip-tests), no longer as the name of an enum member.
            migrationBuilder.Sql("UPDATE source_files SET kind = CASE kind WHEN 'DeviceRegister' THEN 'device-register' WHEN 'TripTests' THEN 'trip-tests' WHEN 'ContactResistance' THEN 'contact-resistance' WHEN 'InsulationResistance' THEN 'insulation-resistance' WHEN 'CurveTable' THEN 'curve-table' WHEN 'AmbientTable' THEN 'ambient-table' WHEN 'InstrumentRegister' THEN 'instrument-register' ELSE kind END;");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("UPDATE source_files SET kind = CASE kind WHEN 'device-register' THEN 'DeviceRegister' WHEN 'trip-tests' THEN 'TripTests' WHEN 'contact-resistance' THEN 'ContactResistance' WHEN 'insulation-resistance' THEN 'InsulationResistance' WHEN 'curve-table' THEN 'CurveTable' WHEN 'ambient-table' THEN 'AmbientTable' WHEN 'instrument-register' THEN 'InstrumentRegister' ELSE kind END;");
        }
    }
}
