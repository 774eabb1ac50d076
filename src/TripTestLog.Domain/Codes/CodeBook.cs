namespace TripTestLog.Domain.Codes;

/// <summary>
/// The one home of the text codes of one kind of value (stage, start, family, curve...): the words record files, the
/// store, fingerprints and program output all use. Reading what a person wrote is forgiving (case, spaces); decoding
/// what the store holds is strict, and an unknown stored value fails loudly rather than reading as something else.
/// </summary>
/// <typeparam name="T">The enum the codes stand for.</typeparam>
public sealed class CodeBook<T>
    where T : struct, Enum
{
    private readonly IReadOnlyList<(T Value, string Code)> _entries;
    private readonly string _what;

    /// <summary>Creates the book; <paramref name="what"/> names the kind of value in messages, e.g. "stage".</summary>
    public CodeBook(string what, params (T Value, string Code)[] entries)
    {
        _what = what;
        _entries = entries;
        var missing = Enum.GetValues<T>().Where(v => !entries.Any(e => e.Value.Equals(v))).ToList();
        if (missing.Count > 0 || entries.Select(e => e.Code).Distinct(StringComparer.OrdinalIgnoreCase).Count() != entries.Length)
        {
            throw new ArgumentException($"every {what} needs exactly one code; missing: {string.Join(", ", missing)}", nameof(entries));
        }
    }

    /// <summary>Every code, in the book's order.</summary>
    public IEnumerable<string> All => _entries.Select(e => e.Code);

    /// <summary>The codes as a list for messages: "a, b or c".</summary>
    public string Choices => _entries.Count == 1 ? _entries[0].Code
        : string.Join(", ", _entries.Take(_entries.Count - 1).Select(e => e.Code)) + " or " + _entries[^1].Code;

    /// <summary>The code of a value.</summary>
    public string Of(T value)
    {
        foreach (var (v, code) in _entries)
        {
            if (v.Equals(value))
            {
                return code;
            }
        }

        throw new ArgumentOutOfRangeException(nameof(value), value, $"no {_what} code");
    }

    /// <summary>Reads a code as a person may write it: trimmed, any case. False when unknown.</summary>
    public bool TryParse(string text, out T value)
    {
        ArgumentNullException.ThrowIfNull(text);
        foreach (var (v, code) in _entries)
        {
            if (string.Equals(code, text.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                value = v;
                return true;
            }
        }

        value = default;
        return false;
    }

    /// <summary>Decodes a stored code exactly; throws <see cref="InvalidDataException"/> naming the value when it is unknown.</summary>
    public T Decode(string stored)
    {
        foreach (var (v, code) in _entries)
        {
            if (string.Equals(code, stored, StringComparison.Ordinal))
            {
                return v;
            }
        }

        throw new InvalidDataException($"the store holds an unknown {_what} '{stored}'; this database was written by another program or version");
    }
}
