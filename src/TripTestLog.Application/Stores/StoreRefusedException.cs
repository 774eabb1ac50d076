namespace TripTestLog.Application.Stores;

/// <summary>
/// A store that this command may not or cannot use as asked: not a TripTestLog database, written by a newer version,
/// behind and not to be migrated here, a role without the rights, or a wait that ran out. The message is one sentence
/// for the person; nothing was written.
/// </summary>
public sealed class StoreRefusedException : Exception
{
    /// <summary>Creates the exception.</summary>
    public StoreRefusedException()
    {
    }

    /// <summary>Creates the exception with its one-sentence message.</summary>
    public StoreRefusedException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with its message and cause.</summary>
    public StoreRefusedException(string message, Exception inner)
        : base(message, inner)
    {
    }
}
