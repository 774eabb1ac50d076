using TripTestLog.Application.Check;
using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>
/// Imports a file through the real pipeline (streaming CSV reader, import rules, the store's batch writer), as the command
/// line does. A <see cref="ParsedFile"/> stands for the file at its path, read again with the default options.
/// </summary>
internal static class StoreImport
{
    public static ImportOutcome Import(this IRecordStore store, string path, DateTimeOffset now, ImportOptions? options = null) =>
        new ImportPipeline(store).Import(new CsvRecordFileSource(path, ReadOptions.Default), options ?? ImportOptions.Strict, Records.Today, now);

    public static ImportOutcome Import(this IRecordStore store, ParsedFile file, DateTimeOffset now, ImportOptions? options = null) =>
        store.Import(file.Path, now, options);

    /// <summary>How many register entries <paramref name="tag"/> has.</summary>
    public static int RevisionCount(this IRecordStore store, AssetTag tag) => store.Revisions(tag).Count;

    /// <summary>Every trip test, by asset tag, then test time, then file line; optionally for one device.</summary>
    public static IReadOnlyList<StoredTrip> Trips(this IRecordStore store, AssetTag? only = null) => [.. store.Devices(only).SelectMany(d => d.Trips)];
}
