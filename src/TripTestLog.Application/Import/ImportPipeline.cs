using TripTestLog.Application.Streams;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Import;

/// <summary>
/// Imports record files one at a time, each whole or not at all. Registers and tables go first, so the measurement
/// files of the same run find their devices. A measurement file streams: each row is parsed, checked against the
/// register and the policy, and stored as it is read, so memory does not grow with the file. A small file (a register,
/// a table) is read whole, because its rules look across rows.
/// </summary>
public sealed class ImportPipeline(IImportStore store)
{
    /// <summary>Imports <paramref name="files"/> in kind order, yielding each file's outcome as it is stored.</summary>
    public IEnumerable<ImportOutcome> Run(IReadOnlyList<IRecordFileSource> files, ImportOptions options, DateOnly today,
        Func<DateTimeOffset> now, Action<string>? starting = null, CancellationToken cancel = default)
    {
        ArgumentNullException.ThrowIfNull(files);
        ArgumentNullException.ThrowIfNull(now);
        foreach (var file in files.OrderBy(f => Order(f.PeekKind())))
        {
            cancel.ThrowIfCancellationRequested();
            starting?.Invoke(file.Name);
            yield return Import(file, options, today, now(), cancel);
        }
    }

    /// <summary>Imports one file; see the class remarks. Outcomes and problems cite it by its name (<see cref="IRecordFileSource.Name"/>).</summary>
    public ImportOutcome Import(IRecordFileSource source, ImportOptions options, DateOnly today, DateTimeOffset now, CancellationToken cancel = default)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(options);
        IRecordFile file;
        try
        {
            file = source.Open(today);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Gone, locked or unreadable since it was listed: refused with the system's reason, never a stack trace.
            return Refused(source.Name, null, 0, [new RowProblem(source.Name, 1, "", $"the file cannot be opened ({e.Message}); check that it exists and can be read")]);
        }

        using var _ = file;
        return file.Kind switch
        {
            RecordKind.TripTests or RecordKind.ContactResistance or RecordKind.InsulationResistance => Measurements(file, file.Kind.Value, options, now, cancel),
            _ => Small(file.ReadAll(), options, now),
        };
    }

    // Registers and tables first: measurement files need their devices, and checks need the tables. Unrecognised last.
    private static int Order(RecordKind? kind) => kind switch
    {
        RecordKind.DeviceRegister => 0,
        RecordKind.InstrumentRegister or RecordKind.CurveTable or RecordKind.AmbientTable => 1,
        null => 3,
        _ => 2,
    };

    private ImportOutcome Small(ParsedFile file, ImportOptions options, DateTimeOffset now)
    {
        if (file.IsUnreadable || file.Kind is null || (file.Problems.Count > 0 && !options.AcceptValid))
        {
            return Refused(file.Path, file.Kind, file.RowsRead, file.Problems);
        }

        if (file.Kind == RecordKind.DeviceRegister && RegisterRules.Conflicts(file) is { Count: > 0 } conflicts)
        {
            // Two different entries for one device and date cannot be sorted out row by row.
            return Refused(file.Path, file.Kind, file.RowsRead, [.. file.Problems, .. conflicts]);
        }

        var outcome = store.StoreSmallFile(file, now);
        if (outcome.Status != ImportStatus.Imported)
        {
            return outcome;
        }

        var log = new ProblemLog();
        log.Add(file.Problems);
        return outcome with { Problems = log.Problems, RefusedRows = log.RefusedLines };
    }

    private ImportOutcome Measurements(IRecordFile file, RecordKind kind, ImportOptions options, DateTimeOffset now, CancellationToken cancel)
    {
        using var batch = store.BeginMeasurements(kind, file.Name, file.Path, now, options.Corrects);
        if (batch.Refusal is { } refusal)
        {
            return Refused(file.Name, kind, 0, [new RowProblem(file.Name, 1, "", refusal)]);
        }

        using var rejects = options.AcceptValid ? file.Rejects() : null;
        var log = new ProblemLog();
        long notTested = 0;

        // The register is searched once per distinct unknown tag, not once per row that carries it.
        var near = new Dictionary<AssetTag, string?>();
        string? NearestTag(AssetTag tag)
        {
            if (!near.TryGetValue(tag, out var found))
            {
                found = near.Count < 1000 ? Text.Spelling.Nearest(tag.Value, batch.RegisterTags) : null;
                near[tag] = found;
            }

            return found;
        }

        foreach (var (row, prepared) in ParsedAhead(file, batch, cancel))
        {
            cancel.ThrowIfCancellationRequested();
            if (row.NotTested)
            {
                notTested++;
                continue;
            }

            var problems = row.Problems;
            if (row.Record is { } record && problems.Count == 0)
            {
                // Rows after a strict file's first bad row are still stored, inside the transaction that will be rolled
                // back, so that every unknown tag and conflict in the file is reported in one go.
                problems = prepared is null
                    ? [ImportProblems.UnknownTag(file.Name, row.Line, TagOf(record), NearestTag(TagOf(record)))]
                    : Store(batch, prepared);
            }

            if (problems.Count > 0)
            {
                log.Add(problems);
                rejects?.Write(row, problems);
            }
        }

        var summary = file.Summary;
        log.Add(summary.Problems);
        if (summary.IsUnreadable || (log.Any && !options.AcceptValid))
        {
            return Refused(file.Name, kind, summary.RowsRead, log.Problems) with { ProblemsOmitted = log.Omitted };
        }

        var result = batch.Complete(summary.Sha256, summary.RowsRead);
        if (!result.Committed)
        {
            return new ImportOutcome(file.Name, kind, ImportStatus.AlreadyImported, summary.RowsRead, 0, 0, 0, [])
            {
                NotTested = notTested, EarlierFile = result.EarlierFile,
            };
        }

        return new ImportOutcome(file.Name, kind, ImportStatus.Imported, summary.RowsRead, result.Added, 0, result.Duplicates, log.Problems)
        {
            Replaced = result.Correction?.Replaced ?? 0,
            Correction = result.Correction,
            NotTested = notTested,
            RefusedRows = log.RefusedLines,
            ProblemsOmitted = log.Omitted,
            RejectsFile = rejects?.Keep(),
        };
    }

    /// <summary>
    /// The file's rows, parsed on another thread a few thousand rows ahead of the store: on two cores the CSV parsing
    /// and the database writes then overlap. The queue is bounded, so memory stays flat; rows keep their order.
    /// </summary>
    private static IEnumerable<(ReadRow Row, PreparedRow? Prepared)> ParsedAhead(IRecordFile file, IMeasurementBatch batch, CancellationToken cancel) =>
        ReadAhead.Of(file.Rows().Select(row => (row, row.Record is { } record && row.Problems.Count == 0 ? batch.Prepare(Measurement(record), row.Line) : null)), 4096, cancel);

    private static IReadOnlyList<RowProblem> Store(IMeasurementBatch batch, PreparedRow row)
    {
        batch.Add(row);
        return [];
    }

    private static AssetTag TagOf(ReadRecord record) => Measurement(record).Tag;

    // A measurement file's rows are measurements; anything else is a fault of the reader, not of the file.
    private static MeasurementRecord Measurement(ReadRecord record) =>
        record as MeasurementRecord ?? throw new ArgumentOutOfRangeException(nameof(record), record.GetType().Name, "not a measurement");

    private static ImportOutcome Refused(string path, RecordKind? kind, long rows, IReadOnlyList<RowProblem> problems) =>
        new(path, kind, ImportStatus.Refused, rows, 0, 0, 0, problems) { RefusedRows = rows };
}
