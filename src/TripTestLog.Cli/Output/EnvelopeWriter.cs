using System.Globalization;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Cli.Output;

/// <summary>An envelope sampled at a list of current multiples, as a table for people or CSV for programs.</summary>
internal static class EnvelopeWriter
{
    /// <summary>Multiples a band is usually read at, joined with the standard's own points.</summary>
    public static IReadOnlyList<double> Multiples(ITripEnvelope envelope) =>
        new[] { 1.0, 1.05, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.25, 2.5, 3.0, 4.0, 5.0, 6.0, 7.0, 8.0, 10.0, 12.0, 15.0, 20.0, 30.0, 50.0 }
            .Concat(envelope.Points.Select(p => p.Multiple.Value))
            .Distinct()
            .Order()
            .ToList();

    /// <summary>The band at <paramref name="multiple"/> for <paramref name="conditions"/>: the very reduction <c>check</c> judges by.</summary>
    public static AppliedBand BandAt(ITripEnvelope envelope, double multiple, TestConditions conditions) =>
        envelope.At(CurrentMultiple.Of(multiple) * envelope.Reference).For(conditions);

    public static void WriteTable(TextWriter writer, ITripEnvelope envelope, string title, TestConditions conditions)
    {
        Wrapped.Write(writer, title, 0, 2);
        writer.WriteLine($"Band for a test {conditions}.");
        writer.WriteLine();
        var table = new TextTable(
            TextColumn.Right($"x {envelope.ReferenceName}", shortening: Shortening.Front), TextColumn.Right("Current"), TextColumn.Right("Min"),
            TextColumn.Right("Max"), TextColumn.Right("Typical min"), TextColumn.Right("Typical max"), TextColumn.Left("Min from"),
            TextColumn.Left("Max from"), TextColumn.Left("Point"));
        foreach (var m in Multiples(envelope))
        {
            var band = BandAt(envelope, m, conditions);
            var point = envelope.Points.FirstOrDefault(p => p.Multiple.Value == m);
            table.Add(
                Format.Number(m, "0.00"),
                band.Current.ToString(),
                band.HasRequirement ? Format.Minimum(band.Minimum) : "no band",
                band.HasRequirement ? Format.Maximum(band.Maximum) : "no band",
                band.TypicalMinimum is { } tn ? Format.Minimum(tn) : "",
                band.TypicalMaximum is { } tx ? Format.Maximum(tx) : "",
                band.HasRequirement ? Format.Source(band.Minimum.Source) : "-",
                band.HasRequirement ? Format.Source(band.Maximum.Source) : "-",
                point?.Label ?? "");
        }

        table.WriteTo(writer);
        writer.WriteLine();
        if (envelope.Points.Count > 0)
        {
            writer.WriteLine("Normative points:");
            foreach (var p in envelope.Points)
            {
                Wrapped.Write(writer, $"{p.Label}: {p.Requirement}", 2, 4);
            }

            writer.WriteLine();
        }

        Wrapped.Write(writer, "Min and Max are guaranteed edges: a trip outside them fails. Typical edges are drawn lines; a trip outside them "
            + "only raises an advisory. Edge sources: normative = the standard's own point, at its current or carried in the "
            + "direction physics gives it; derived = from a point by I²t; characteristic = the standard's formula; setting = the "
            + "device's settings with their tolerances; curve-table = the lab's table from the maker's curve. Min \"never\": must "
            + "not trip at all; max \"none\": no trip required.", 0);
        Wrapped.Write(writer, Safety.Caution, 0);
    }

    /// <summary>
    /// CSV: multiple,current_a,min_s,max_s,min_source,max_source,point,typical_min_s,typical_max_s. An empty max_s means
    /// unbounded; a row with empty min_s and max_s has no band; empty typical columns mean no drawn edge inside the band.
    /// </summary>
    public static void WriteCsv(TextWriter writer, ITripEnvelope envelope, TestConditions conditions)
    {
        writer.WriteLine("multiple,current_a,min_s,max_s,min_source,max_source,point,typical_min_s,typical_max_s");
        foreach (var m in Multiples(envelope))
        {
            var band = BandAt(envelope, m, conditions);
            var point = envelope.Points.FirstOrDefault(p => p.Multiple.Value == m)?.Label ?? "";
            var min = band.HasRequirement ? R(band.Minimum.Limit?.Value) : "";
            var max = band.HasRequirement ? R(band.Maximum.Limit?.Value) : "";
            writer.WriteLine(string.Join(',', R(m), R(band.Current.Value), min, max,
                band.HasRequirement ? Format.Source(band.Minimum.Source) : "none",
                band.HasRequirement ? Format.Source(band.Maximum.Source) : "none", point,
                R(band.TypicalMinimum?.Limit?.Value), R(band.TypicalMaximum?.Limit?.Value)));
        }
    }

    private static string R(double? value) => value is { } v ? v.ToString("0.######", CultureInfo.InvariantCulture) : "";
}
