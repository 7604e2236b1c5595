namespace SpecLint.Core.Units;

/// <summary>A value that does not follow the quantity grammar; the message says how to write it.</summary>
public sealed class QuantityParseException : FormatException
{
    /// <summary>Creates the exception with a message for the user.</summary>
    public QuantityParseException(string message)
        : base(message)
    {
    }
}
