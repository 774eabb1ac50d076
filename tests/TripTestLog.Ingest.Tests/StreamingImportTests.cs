using System.Globalization;
using System.Text;
using Microsoft.Data.Sqlite;
using TripTestLog.Application.Import;
using TripTestLog.Storage;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>A measurement file streams through the import: read once, every row accounted for, all of it or none stored.</summary>
public sealed class StreamingImportTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    private static string BigTripFile(TempFolder temp, int rows, int? badLine)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n");
        var start = new DateTime(2024, 1, 1, 0, 0, 0);
        for (var i = 0; i < rows; i++)
        {
            var line = i + 2;
            var current = line == badLine ? "forty" : (40 + (i % 100) * 0.01).ToString("0.00", CultureInfo.InvariantCulture);
            sb.Append("T-01,").Append(start.AddMinutes(i).ToString("yyyy-MM-ddTHH:mm", CultureInfo.InvariantCulture))
                .Append(",as-found,all,").Append(current).Append(",22.5,,cold\n");
        }

        return temp.Write("big.csv", sb.ToString());
    }

    private static long Count(string db, string sql) => Sql.Count(db, sql);

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AStrictFileWithOneBadRowNearItsEnd_StoresNothing_AndNamesTheRow(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using (var store = db.Open())
        {
            store.Import(temp.Write("register.csv", Records.Register), Now);
            var path = BigTripFile(temp, 30_000, badLine: 29_500);

            var outcome = store.Import(path, Now);

            Assert.Equal((ImportStatus.Refused, 30_000L), (outcome.Status, outcome.RowsRead));
            var problem = Assert.Single(outcome.Problems);
            Assert.Equal((29_500L, "current_a"), (problem.Line, problem.Column));
        }

        Assert.Equal(0, db.Count("SELECT COUNT(*) FROM trip_tests"));
        Assert.Equal(1, db.Count("SELECT COUNT(*) FROM source_files"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AFileIsHashedWhileItIsRead_AndTheHashIsTheFilesOwn(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        store.Import(temp.Write("register.csv", Records.Register), Now);
        var path = BigTripFile(temp, 5_000, badLine: null);

        var outcome = store.Import(path, Now);
        using var file = new CsvRecordFileSource(path, ReadOptions.Default).Open(Records.Today);
        foreach (var _ in file.Rows())
        {
        }

        Assert.Equal((ImportStatus.Imported, 5_000L), (outcome.Status, outcome.Added));
        Assert.Equal(FileHash.Sha256(path), file.Summary.Sha256);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACancelledImport_StoresNothing(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using (var store = db.Open())
        {
            store.Import(temp.Write("register.csv", Records.Register), Now);
            var path = BigTripFile(temp, 20_000, badLine: null);
            using var cancel = new CancellationTokenSource();
            var source = new CountingSource(new CsvRecordFileSource(path, ReadOptions.Default), after: 10_000, cancel);

            Assert.Throws<OperationCanceledException>(() => new ImportPipeline(store).Import(source, ImportOptions.Strict, Records.Today, Now, cancel.Token));
        }

        Assert.Equal(0, db.Count("SELECT COUNT(*) FROM trip_tests"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TheSameFileImportedTwice_IsStoredOnce(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        store.Import(temp.Write("register.csv", Records.Register), Now);
        var path = BigTripFile(temp, 2_000, badLine: null);

        var first = store.Import(path, Now);
        var second = store.Import(path, Now);

        Assert.Equal((ImportStatus.Imported, 2_000L), (first.Status, first.Added));
        Assert.Equal((ImportStatus.AlreadyImported, 0L), (second.Status, second.Added));
        Assert.Equal(2_000, db.Count("SELECT COUNT(*) FROM trip_tests"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AFileGoneBeforeItIsOpened_IsRefusedWithAPlainReason(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        var path = temp.Write("gone.csv", Records.Trips);
        File.Delete(path);

        var outcome = store.Import(path, Now);

        Assert.Equal(ImportStatus.Refused, outcome.Status);
        Assert.Contains("cannot be opened", Assert.Single(outcome.Problems).Reason);
    }

    // Cancels the token once a number of rows has been read, as Ctrl+C would in the middle of a file.
    private sealed class CountingSource(IRecordFileSource inner, int after, CancellationTokenSource cancel) : IRecordFileSource
    {
        public string Path => inner.Path;

        public string Name => inner.Name;

        public Application.Records.RecordKind? PeekKind() => inner.PeekKind();

        public IRecordFile Open(DateOnly today) => new CountingFile(inner.Open(today), after, cancel);
    }

    private sealed class CountingFile(IRecordFile inner, int after, CancellationTokenSource cancel) : IRecordFile
    {
        public string Path => inner.Path;

        public string Name => inner.Name;

        public Application.Records.RecordKind? Kind => inner.Kind;

        public FileSummary Summary => inner.Summary;

        public IEnumerable<ReadRow> Rows()
        {
            var n = 0;
            foreach (var row in inner.Rows())
            {
                if (++n == after)
                {
                    cancel.Cancel();
                }

                yield return row;
            }
        }

        public Application.Records.ParsedFile ReadAll() => inner.ReadAll();

        public IRejectsSink Rejects() => inner.Rejects();

        public void Dispose() => inner.Dispose();
    }
}
