namespace TripTestLog.Domain.Measurements;

/// <summary>The pole a measurement was taken on: 1 to 4, the neutral, or all poles together.</summary>
public readonly record struct Pole
{
    private Pole(string code) => Code = code;

    /// <summary>All poles loaded together.</summary>
    public static Pole All => new("all");

    /// <summary>The neutral pole.</summary>
    public static Pole Neutral => new("N");

    /// <summary>The code as written in record files: 1, 2, 3, 4, N or all.</summary>
    public string Code { get; }

    /// <summary>Reads a pole code; returns false when it is none of 1-4, N or all.</summary>
    public static bool TryParse(string text, out Pole pole)
    {
        pole = text.Trim() switch
        {
            "1" or "2" or "3" or "4" => new Pole(text.Trim()),
            "N" or "n" => Neutral,
            "all" or "ALL" or "All" => All,
            _ => default,
        };
        return pole.Code is not null;
    }

    /// <summary>Reads a pole code; throws <see cref="ArgumentException"/> when it is none of 1-4, N or all.</summary>
    public static Pole Parse(string text) =>
        TryParse(text, out var pole) ? pole : throw new ArgumentException($"'{text}' is not a pole: use 1, 2, 3, 4, N or all.", nameof(text));

    /// <inheritdoc />
    public override string ToString() => Code ?? "";
}
