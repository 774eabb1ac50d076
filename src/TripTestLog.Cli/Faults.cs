namespace TripTestLog.Cli;

/// <summary>
/// Tells a problem the person can fix from a fault in the tool. The person's: what a database, its server or its driver
/// refused (in the store's own words), a file or folder that cannot be read or written, a stored value or an address
/// that cannot be read, an operation this kind of store does not offer, a value a domain factory refused, a stop asked
/// for with Ctrl+C. Anything else (a null where the tool assumed a value, a missing key, a cast that fails) is the
/// tool's own fault.
/// </summary>
internal static class Faults
{
    /// <summary>True when <paramref name="e"/> is a problem the person can act on, worth one plain sentence and exit 2.</summary>
    public static bool IsTheUsers(Exception e)
    {
        if (Services.Stores.Plain(e) is not null)
        {
            return true;
        }

        var innermost = e;
        while (innermost.InnerException is { } inner)
        {
            innermost = inner;
        }

        // Ctrl+C in a command that does not say more about it is the person's own stop, not a fault.
        return innermost is IOException or UnauthorizedAccessException or InvalidDataException or FormatException or NotSupportedException
                or OperationCanceledException
            || (innermost is ArgumentException && innermost is not ArgumentNullException);
    }
}
