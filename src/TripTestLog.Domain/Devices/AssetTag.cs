namespace TripTestLog.Domain.Devices;

/// <summary>The unique key of a device in the register: 1 to 64 printable characters, no surrounding spaces, compared exactly.</summary>
public readonly record struct AssetTag
{
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

    /// <inheritdoc />
    public override string ToString() => Value;
}
