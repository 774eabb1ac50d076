using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace TripTestLog.Migrations.Postgres.Migrations
{
    /// <inheritdoc />
    public partial class PeerPositions : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "peer_positions",
                columns: table => new
                {
                    id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    device_id = table.Column<long>(type: "bigint", nullable: false),
                    group_key = table.Column<string>(type: "text", nullable: false),
                    position = table.Column<double>(type: "double precision", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_peer_positions", x => x.id);
                    table.ForeignKey(
                        name: "FK_peer_positions_devices_device_id",
                        column: x => x.device_id,
                        principalTable: "devices",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateTable(
                name: "peer_stamps",
                columns: table => new
                {
                    device_id = table.Column<long>(type: "bigint", nullable: false),
                    basis = table.Column<string>(type: "text", nullable: false),
                    stamp = table.Column<string>(type: "text", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_peer_stamps", x => x.device_id);
                    table.ForeignKey(
                        name: "FK_peer_stamps_devices_device_id",
                        column: x => x.device_id,
                        principalTable: "devices",
                        principalColumn: "id",
                        onDelete: ReferentialAction.Cascade);
                });

            migrationBuilder.CreateIndex(
                name: "IX_peer_positions_device_id",
                table: "peer_positions",
                column: "device_id");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "peer_positions");

            migrationBuilder.DropTable(
                name: "peer_stamps");
        }
    }
}
