namespace SpecLint.Rules.Changes;

/// <summary>How a spec file differs from its version at the merge base (the JSON <c>status</c> values).</summary>
internal enum ChangeStatus
{
    /// <summary>New since the merge base.</summary>
    Added,

    /// <summary>Edited in place, or re-checked because the configuration or the house rules changed.</summary>
    Changed,

    /// <summary>Moved (possibly with edits); <see cref="FileChange.PreviousPath"/> holds the old path.</summary>
    Renamed,

    /// <summary>Gone on the head.</summary>
    Deleted,
}

/// <summary>The names the JSON output and the reports use for <see cref="ChangeStatus"/>.</summary>
internal static class ChangeStatusNames
{
    public static string Name(this ChangeStatus status) => status switch
    {
        ChangeStatus.Added => "added",
        ChangeStatus.Changed => "changed",
        ChangeStatus.Renamed => "renamed",
        _ => "deleted",
    };
}
