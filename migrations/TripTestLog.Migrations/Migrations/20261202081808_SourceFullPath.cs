using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace TripTestLog.Migrations.Migrations
{
    /// <inheritdoc />
    public partial class SourceFullPath : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<string>(
                name: "full_path",
                table: "source_files",
                type: "TEXT",
                nullable: false,
                defaultValue: "");

            // Files imported before this column held their full path as their name: it is where they were read from.
            migrationBuilder.Sql("UPDATE source_files SET full_path = file_name WHERE full_path = ''");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropColumn(
                name: "full_path",
                table: "source_files");
        }
    }
}
