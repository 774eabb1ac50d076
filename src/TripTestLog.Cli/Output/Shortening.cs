namespace TripTestLog.Cli.Output;

/// <summary>
/// How a cell longer than its column is cut, marked with '…': a column without a rule lets a long cell push its row out.
/// </summary>
internal enum Shortening
{
    None,

    /// <summary>Keeps the end, where a path tells files apart.</summary>
    Front,

    /// <summary>Keeps the first three and the last characters, where asset tags tell devices apart.</summary>
    Middle,

    /// <summary>Keeps the start, as prose is read.</summary>
    End,
}
