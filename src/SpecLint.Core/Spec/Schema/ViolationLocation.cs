namespace SpecLint.Core.Spec.Schema;

/// <summary>Which part of the file a schema message should point at.</summary>
internal enum ViolationLocation
{
    /// <summary>The value at the pointer.</summary>
    Value,

    /// <summary>The key holding the value at the pointer (an unknown key reads best at the key).</summary>
    Key,

    /// <summary>The parent of the pointer (a missing key has no position of its own).</summary>
    Parent,
}
