namespace SpecLint.Core.Spec.Model;

/// <summary>
/// Which way the signal current flows at the summing node (references.md §D3, Orientation). Out of the node
/// drives the output above the bias voltage; into the node drives it below.
/// </summary>
public enum CurrentDirection
{
    OutOfNode,
    IntoNode,
}
