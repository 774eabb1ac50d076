using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>
/// Imports a file through the real pipeline (streaming CSV reader, import rules, SQLite batch writer), as the command
/// line does. A <see cref="ParsedFile"/> stands for the file at its path, read again with the default options.
/// </summary>
internal static class StoreImport
{
    public static ImportOutcome Import(this RecordStore store, string path, DateTimeOffset now, ImportOptions? options = null) =>
        new ImportPipeline(store).Import(new CsvRecordFileSource(path, ReadOptions.Default), options ?? ImportOptions.Strict, Records.Today, now);

    public static ImportOutcome Import(this RecordStore store, ParsedFile file, DateTimeOffset now, ImportOptions? options = null) =>
        store.Import(file.Path, now, options);
}
