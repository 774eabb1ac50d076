using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Transfer;

/// <summary>How one file came across.</summary>
/// <param name="File">The file, as the source store holds it.</param>
/// <param name="Copied">False when the target already held a file with the same content.</param>
/// <param name="Records">The records that trace to it in the source.</param>
/// <param name="Added">The records the target did not hold before.</param>
public sealed record TransferredFile(StoredFile File, bool Copied, long Records, long Added);

/// <summary>
/// Copies one store into another, file by file, oldest first, through the target's own import: each file keeps its name,
/// path, hash, time and lines, and a register keeps its history, because each is written again as the import first
/// wrote it. A file the target already holds (by hash) is skipped, so a second transfer adds nothing. Each file is one
/// transaction of the target's; a measurement file streams through.
/// </summary>
public sealed class TransferPipeline(IRecordStore source, IRecordStore target)
{
    /// <summary>
    /// Copies <paramref name="files"/> (the source's <see cref="IRecordExport.Files"/>, read once by the caller, which
    /// may count them for progress; every file when null), then the corrections; <paramref name="progress"/> hears of
    /// each file as it is done.
    /// </summary>
    public (IReadOnlyList<TransferredFile> Files, long Changes) Run(
        IReadOnlyList<StoredFile>? files = null, Action<TransferredFile>? progress = null, CancellationToken cancel = default)
    {
        var done = new List<TransferredFile>();
        foreach (var file in files ?? [.. source.Files()])
        {
            cancel.ThrowIfCancellationRequested();
            var copied = IsMeasurement(file.Kind) ? Measurements(file, cancel) : SmallFile(file);
            done.Add(copied);
            progress?.Invoke(copied);
        }

        return (done, target.AddChanges(source.Changes()));
    }

    private static bool IsMeasurement(RecordKind kind) => kind is RecordKind.TripTests or RecordKind.ContactResistance or RecordKind.InsulationResistance;

    private TransferredFile Measurements(StoredFile file, CancellationToken cancel)
    {
        using var batch = target.BeginMeasurements(file.Kind, file.Name, file.FullPath, file.ImportedAt);
        long records = 0;
        foreach (var (read, line) in source.Records(file))
        {
            cancel.ThrowIfCancellationRequested();
            records++;
            var record = read as MeasurementRecord ?? throw new InvalidOperationException($"{file.Name}:{line}: not a measurement");
            var row = batch.Prepare(record, line)
                ?? throw new InvalidOperationException($"{file.Name}:{line}: the target's register has no device {record.Tag}");
            batch.Add(row);
        }

        var result = batch.Complete(file.Sha256, file.RowsRead);
        return new TransferredFile(file, result.Committed, records, result.Added);
    }

    private TransferredFile SmallFile(StoredFile file)
    {
        var records = source.Records(file).ToList();
        var parsed = new ParsedFile
        {
            Path = file.Name,
            FullPath = file.FullPath,
            Sha256 = file.Sha256,
            Kind = file.Kind,
            RowsRead = file.RowsRead,
            Devices = Of(records, r => (r as RegisterRecord)?.Device),
            CurveTableRows = Of(records, r => (r as CurveRowRecord)?.Row),
            AmbientTableRows = Of(records, r => (r as AmbientRowRecord)?.Row),
            Instruments = Of(records, r => (r as CalibrationRecord)?.Calibration),
        };
        var outcome = target.StoreSmallFile(parsed, file.ImportedAt);
        return new TransferredFile(file, outcome.Status == ImportStatus.Imported, records.Count, outcome.Added + outcome.Updated);
    }

    private static List<Located<T>> Of<T>(List<Located<ReadRecord>> records, Func<ReadRecord, T?> pick)
        where T : class =>
        [.. records.Select(r => (Value: pick(r.Record), r.Line)).Where(r => r.Value is not null).Select(r => new Located<T>(r.Value!, r.Line))];
}
