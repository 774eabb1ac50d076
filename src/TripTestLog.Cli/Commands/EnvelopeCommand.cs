using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Cli.Commands;

/// <summary>`envelope`: the allowed trip-time band of a device type, as a table or CSV.</summary>
internal static class EnvelopeCommand
{
    public static Command Create(CliContext cli)
    {
        var family = new Option<string>("--family") { Description = "Device family: iec60898", DefaultValueFactory = _ => "iec60898", HelpName = "FAMILY" };
        var curve = new Option<string?>("--curve") { Description = "IEC 60898-1 curve: B, C or D", HelpName = "B|C|D" };
        var rated = new Option<double?>("--rated") { Description = "Rated current In in amperes", HelpName = "AMPERES" };
        var csv = new Option<bool>("--csv") { Description = "Write CSV: multiple,current_a,min_s,max_s,min_source,max_source,point" };
        var command = new Command("envelope", "Show the trip-time band a device must meet, from its standard")
        {
            family, curve, rated, csv,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(family)!, parse.GetValue(curve), parse.GetValue(rated), parse.GetValue(csv)));
        return command;
    }

    private static int Run(CliContext cli, string family, string? curveText, double? rated, bool csv)
    {
        if (!string.Equals(family, "iec60898", StringComparison.OrdinalIgnoreCase))
        {
            return Usage(cli, $"--family: '{family}' is not a known family; use iec60898");
        }

        TripCurve? parsed = curveText?.Trim().ToUpperInvariant() switch
        {
            "B" => TripCurve.B,
            "C" => TripCurve.C,
            "D" => TripCurve.D,
            _ => null,
        };
        if (parsed is not { } curve)
        {
            return Usage(cli, "--curve: give B, C or D");
        }

        if (rated is not { } amps || !double.IsFinite(amps) || amps <= 0 || amps > 10_000)
        {
            return Usage(cli, "--rated: give the rated current in amperes, e.g. --rated 16");
        }

        var envelope = new Iec60898Envelope(curve, Amperes.Of(amps));
        if (csv)
        {
            EnvelopeWriter.WriteCsv(cli.Out, envelope);
        }
        else
        {
            EnvelopeWriter.WriteTable(cli.Out, envelope, $"IEC 60898-1 curve {curve}, In = {Amperes.Of(amps)}");
        }

        return ExitCodes.Ok;
    }

    private static int Usage(CliContext cli, string message)
    {
        cli.Error.WriteLine("error: " + message);
        return ExitCodes.BadInput;
    }
}
