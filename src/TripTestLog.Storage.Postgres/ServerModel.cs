using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;

namespace TripTestLog.Storage.Postgres;

/// <summary>What the server adds to the shared model: its own column types (<see cref="ServerColumnTypes"/>).</summary>
internal sealed class ServerModel(ModelCustomizerDependencies dependencies) : RelationalModelCustomizer(dependencies)
{
    public override void Customize(ModelBuilder modelBuilder, DbContext context)
    {
        base.Customize(modelBuilder, context);
        ServerColumnTypes.Apply(modelBuilder);
        TripTestLogContext.NameColumns(modelBuilder);
    }
}
