namespace TripTestLog.Storage.Postgres;

/// <summary>The server could not be reached, or refused the login or the database; the message says which, in one sentence.</summary>
public sealed class StoreUnavailableException : Exception
{
    /// <summary>Creates the exception.</summary>
    public StoreUnavailableException()
    {
    }

    /// <summary>Creates the exception with its message.</summary>
    public StoreUnavailableException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with its message and cause.</summary>
    public StoreUnavailableException(string message, Exception inner)
        : base(message, inner)
    {
    }
}
