using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage.Sqlite;

/// <summary>What the SQLite file adds to the shared model: rows written before settings were stored had none.</summary>
internal sealed class SqliteModel(ModelCustomizerDependencies dependencies) : RelationalModelCustomizer(dependencies)
{
    public override void Customize(ModelBuilder modelBuilder, DbContext context)
    {
        base.Customize(modelBuilder, context);
        modelBuilder.Entity<DeviceRow>().Property(x => x.SettingsJson).HasDefaultValue("");
        modelBuilder.Entity<DeviceRevisionRow>().Property(x => x.SettingsJson).HasDefaultValue("");
    }
}
