namespace SpecLint.Rules.Changes;

/// <summary>Which findings can fail a run compared against a base (<c>--gate</c>).</summary>
internal enum Gate
{
    /// <summary>Every unwaived finding at or above the fail level in the specs checked (the default).</summary>
    All,

    /// <summary>Only findings the change introduced.</summary>
    New,
}
