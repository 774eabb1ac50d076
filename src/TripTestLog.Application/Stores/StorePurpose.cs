namespace TripTestLog.Application.Stores;

/// <summary>What a command opens a store for; it decides what opening may write.</summary>
public enum StorePurpose
{
    /// <summary>Reading only: nothing is created, migrated or written; a SQLite file is opened read-only.</summary>
    Read,

    /// <summary>Importing: creates a database where no file exists, and brings an older schema up to date.</summary>
    Import,

    /// <summary>The `migrate` command: brings an existing database's schema up to date; never creates one.</summary>
    Migrate,
}
