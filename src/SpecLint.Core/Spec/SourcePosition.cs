namespace SpecLint.Core.Spec;

/// <summary>Where a YAML node sits in its file; 1-based, as editors count.</summary>
/// <param name="Line">Line of the value's first character.</param>
/// <param name="Column">Column of the value's first character.</param>
/// <param name="EndLine">Line just after the value.</param>
/// <param name="EndColumn">Column just after the value.</param>
/// <param name="KeyLine">Line of the key that holds the value (0 for the root and sequence items).</param>
/// <param name="KeyColumn">Column of that key.</param>
public readonly record struct SourcePosition(int Line, int Column, int EndLine, int EndColumn, int KeyLine, int KeyColumn)
{
    /// <summary>The start of a file, for problems that have no better place.</summary>
    public static SourcePosition FileStart => new(1, 1, 1, 1, 0, 0);
}
