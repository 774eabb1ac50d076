namespace TripTestLog.Cli;

/// <summary>Process exit codes, the same for every command.</summary>
internal static class ExitCodes
{
    /// <summary>Done.</summary>
    public const int Ok = 0;

    /// <summary>Done, with findings that need attention (only where the caller asked with --fail-on-findings), or files refused on import.</summary>
    public const int Findings = 1;

    /// <summary>Bad usage or input that stopped the command.</summary>
    public const int BadInput = 2;

    /// <summary>A fault in the tool itself: one sentence on stderr, the exception with its stack in the log.</summary>
    public const int InternalError = 3;
}
