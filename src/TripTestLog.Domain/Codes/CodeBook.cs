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
    private readonly (T Value, string Code)[] _entries;
    private readonly string[] _codes;
    private readonly string _what;

    /// <summary>Creates the book; <paramref name="what"/> names the kind of value in messages, e.g. "stage".</summary>
    public CodeBook(string what, params (T Value, string Code)[] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        _what = what;
        _entries = entries;

        // Plain loops, not LINQ over T: every command builds these books at start, and LINQ over a value type of our
        // own is compiled on first use for each book, which cost a command some 60 ms before it began.
        _codes = new string[entries.Length];
        var distinct = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        for (var i = 0; i < entries.Length; i++)
        {
            _codes[i] = entries[i].Code;
            distinct.Add(entries[i].Code);
        }

        var missing = new List<string>();
        foreach (var value in Enum.GetValues(typeof(T)))
        {
            var found = false;
            for (var i = 0; i < entries.Length && !found; i++)
            {
                found = entries[i].Value.Equals(value);
            }

            if (!found)
            {
                missing.Add(value.ToString()!);
            }
        }

        if (missing.Count > 0 || distinct.Count != entries.Length)
        {
            throw new ArgumentException($"every {what} needs exactly one code; missing: {string.Join(", ", missing)}", nameof(entries));
        }

        All = Array.AsReadOnly(_codes);
        Choices = _codes.Length == 1 ? _codes[0] : string.Join(", ", _codes[..^1]) + " or " + _codes[^1];
    }

    /// <summary>Every code, in the book's order.</summary>
    public IEnumerable<string> All { get; }

    /// <summary>The codes as a list for messages: "a, b or c".</summary>
    public string Choices { get; }

    /// <summary>The code of a value.</summary>
    public string Of(T value)
    {
        // The runtime's comparer for T compares without boxing: Equals(object) boxed every value looked up, and a check
        // looks up several codes for every test it writes.
        foreach (var (v, code) in _entries)
        {
            if (EqualityComparer<T>.Default.Equals(v, value))
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
