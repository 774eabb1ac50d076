namespace TripTestLog.Domain.Devices;

/// <summary>
/// The unique key of a device in the register: 1 to 64 printable characters, no surrounding spaces. Tags are compared
/// without regard to the case of the letters A to Z, as labs mean them (arw-msb-q01 and ARW-MSB-Q01 are one device);
/// other characters compare exactly, as SQLite's NOCASE does. A tag keeps the spelling it was first registered with.
/// </summary>
public readonly record struct AssetTag
{
    /// <summary>How tags compare and hash wherever they key a lookup: letters A to Z without regard to case, the rest exactly.</summary>
    public static StringComparer Comparer { get; } = new TagComparer();

    /// <summary>The longest tag accepted.</summary>
    public const int MaxLength = 64;

    private AssetTag(string value) => Value = value;

    /// <summary>The tag as written in the register.</summary>
    public string Value { get; }

    /// <summary>Creates a tag; throws <see cref="ArgumentException"/> when it is empty, too long, padded or holds control characters.</summary>
    public static AssetTag Of(string tag)
    {
        ArgumentNullException.ThrowIfNull(tag);
        if (!IsValid(tag, out var reason))
        {
            throw new ArgumentException(reason, nameof(tag));
        }

        return new AssetTag(tag);
    }

    /// <summary>Whether a string can be a tag, with the reason when it cannot.</summary>
    public static bool IsValid(string tag, out string reason)
    {
        reason = tag switch
        {
            "" => "an asset tag must not be empty",
            { Length: > MaxLength } => $"an asset tag is at most {MaxLength} characters",
            _ when tag.Trim().Length != tag.Length => "an asset tag must not start or end with spaces",
            _ when tag.Any(char.IsControl) => "an asset tag must not hold control characters",
            _ => "",
        };
        return reason.Length == 0;
    }

    /// <summary>Equal when the tags differ at most in the case of letters A to Z.</summary>
    public bool Equals(AssetTag other) => Comparer.Equals(Value, other.Value);

    /// <inheritdoc />
    public override int GetHashCode() => Comparer.GetHashCode(Value ?? "");

    /// <inheritdoc />
    public override string ToString() => Value;

    // Runs for every row an import resolves and every device a read merges, so it folds as it goes and allocates nothing.
    private sealed class TagComparer : StringComparer
    {
        public override int Compare(string? x, string? y)
        {
            if (x is null || y is null)
            {
                return string.CompareOrdinal(x, y);
            }

            for (var i = 0; i < Math.Min(x.Length, y.Length); i++)
            {
                var d = Fold(x[i]) - Fold(y[i]);
                if (d != 0)
                {
                    return d;
                }
            }

            return x.Length - y.Length;
        }

        public override bool Equals(string? x, string? y)
        {
            if (x is null || y is null || x.Length != y.Length)
            {
                return ReferenceEquals(x, y);
            }

            for (var i = 0; i < x.Length; i++)
            {
                if (Fold(x[i]) != Fold(y[i]))
                {
                    return false;
                }
            }

            return true;
        }

        public override int GetHashCode(string obj)
        {
            var hash = new HashCode();
            foreach (var c in obj)
            {
                hash.Add(Fold(c));
            }

            return hash.ToHashCode();
        }

        // Only a to z fold, so the rule is the same here and in the database.
        private static char Fold(char c) => c is >= 'a' and <= 'z' ? (char)(c - 32) : c;
    }
}
