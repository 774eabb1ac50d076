namespace TripTestLog.Application.Stores;

/// <summary>What `verify` found about one imported file.</summary>
public enum SourceFileState
{
    /// <summary>The file is at its recorded path and its SHA-256 matches.</summary>
    Matches,

    /// <summary>The file is at its recorded path but its content has changed since import.</summary>
    Changed,

    /// <summary>The file is not at its recorded path; it cannot be checked here.</summary>
    NotAtHand,

    /// <summary>The file at the path was corrected and imported again (e.g. with --replace): its content is a later import's. Not a fault.</summary>
    Superseded,
}

/// <summary>One imported file as verified.</summary>
/// <param name="Path">The path recorded at import.</param>
/// <param name="Sha256">The hash recorded at import.</param>
/// <param name="State">Matches, changed, or not at hand.</param>
/// <param name="Records">How many stored records trace to it.</param>
public sealed record VerifiedFile(string Path, string Sha256, SourceFileState State, long Records);

/// <summary>The result of `verify`: the database's own checks and the project's traceability checks.</summary>
/// <param name="IntegrityErrors">What the database's own integrity check reported (SQLite: PRAGMA integrity_check lines other than "ok").</param>
/// <param name="ForeignKeyErrors">Broken references the database's own check found (SQLite: PRAGMA foreign_key_check).</param>
/// <param name="UntracedRecords">Records whose source file row is missing.</param>
/// <param name="Files">Every imported file.</param>
public sealed record VerifyReport(IReadOnlyList<string> IntegrityErrors, long ForeignKeyErrors, long UntracedRecords, IReadOnlyList<VerifiedFile> Files)
{
    /// <summary>
    /// The database's own page-level check as the report names it, or null when the store leaves that check to the
    /// server's administrator (a server database's own tools run it, not this one).
    /// </summary>
    public string? IntegrityCheck { get; init; } = "SQLite integrity check";

    /// <summary>Measurement records whose values no longer give the fingerprint stored with them: changed outside the tool.</summary>
    public long AlteredRecords { get; init; }

    /// <summary>The first hundred of <see cref="AlteredRecords"/>, each as its table, file and line.</summary>
    public IReadOnlyList<string> AlteredExamples { get; init; } = [];

    /// <summary>True when nothing is wrong (files not at hand are not faults).</summary>
    public bool Sound => IntegrityErrors.Count == 0 && ForeignKeyErrors == 0 && UntracedRecords == 0 && AlteredRecords == 0
        && Files.All(f => f.State != SourceFileState.Changed);
}
