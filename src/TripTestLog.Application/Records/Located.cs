namespace TripTestLog.Application.Records;

/// <summary>A record with the line of its file it was read from.</summary>
/// <param name="Record">The parsed record.</param>
/// <param name="Line">The 1-based line its row starts on.</param>
public readonly record struct Located<T>(T Record, long Line);
