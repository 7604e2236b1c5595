namespace SpecLint.Core.Spec.Schema.Quick;

/// <summary>The JSON types a schema's <c>type</c> allows.</summary>
[Flags]
internal enum QuickTypes
{
    None = 0,
    Null = 1,
    Boolean = 2,
    String = 4,
    Integer = 8,
    Number = 16,
    Object = 32,
    Array = 64,
    Any = Null | Boolean | String | Integer | Number | Object | Array,
}

/// <summary>What the quick check makes of one node.</summary>
internal enum QuickKind
{
    Null,
    Boolean,
    String,
    /// <summary>A whole number that every reader agrees is one.</summary>
    Integer,
    Number,
    Object,
    Array,
    /// <summary>A value the quick check does not judge (not finite, a huge whole number, another node type).</summary>
    Unsure,
}

internal static class QuickTypesExtensions
{
    /// <summary>Whether a node of <paramref name="kind"/> has an allowed type; "number" includes whole numbers.</summary>
    public static bool Allows(this QuickTypes types, QuickKind kind) => kind switch
    {
        QuickKind.Null => types.HasFlag(QuickTypes.Null),
        QuickKind.Boolean => types.HasFlag(QuickTypes.Boolean),
        QuickKind.String => types.HasFlag(QuickTypes.String),
        QuickKind.Integer => (types & (QuickTypes.Integer | QuickTypes.Number)) != 0,
        QuickKind.Number => types.HasFlag(QuickTypes.Number),
        QuickKind.Object => types.HasFlag(QuickTypes.Object),
        QuickKind.Array => types.HasFlag(QuickTypes.Array),
        _ => false,
    };

    /// <summary>The flag of a JSON Schema type name, or null for a name the quick check does not know.</summary>
    public static QuickTypes? FromName(string name) => name switch
    {
        "null" => QuickTypes.Null,
        "boolean" => QuickTypes.Boolean,
        "string" => QuickTypes.String,
        "integer" => QuickTypes.Integer,
        "number" => QuickTypes.Number,
        "object" => QuickTypes.Object,
        "array" => QuickTypes.Array,
        _ => null,
    };
}
