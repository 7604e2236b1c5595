using System.Collections.Immutable;
using System.Composition;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.Text;

namespace SpecLint.Analyzers.CodeFixes;

/// <summary>
/// Applies the fixes the analyzers compute: each diagnostic carries, per fix, a title and the text that
/// replaces its first additional location (or the diagnostic's own span when it has none). The analyzer
/// decides what is right; this class only edits text, so it cannot drift from the analyzers.
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(ReplacementCodeFixProvider)), Shared]
public sealed class ReplacementCodeFixProvider : CodeFixProvider
{
    /// <inheritdoc />
    public override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(
        DiagnosticIds.ImplausibleMagnitude, DiagnosticIds.UnitNameMismatch, DiagnosticIds.MixedUnitArithmetic,
        DiagnosticIds.CelsiusInThermalProduct, DiagnosticIds.DegreesAsRadians, DiagnosticIds.AngularFrequencyAsHertz,
        DiagnosticIds.DecibelScale, DiagnosticIds.OptionDimensionMismatch);

    /// <inheritdoc />
    public override FixAllProvider? GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    /// <inheritdoc />
    public override Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        foreach (var diagnostic in context.Diagnostics)
        {
            var span = diagnostic.AdditionalLocations.Count > 0 ? diagnostic.AdditionalLocations[0].SourceSpan : diagnostic.Location.SourceSpan;
            for (var i = 0; diagnostic.Properties.TryGetValue(Fixes.TextKey(i), out var text) && text is not null; i++)
            {
                var title = diagnostic.Properties.TryGetValue(Fixes.TitleKey(i), out var t) && t is not null ? t : text;
                var replacement = text;
                context.RegisterCodeFix(
                    CodeAction.Create(title, ct => Replace(context.Document, span, replacement, ct), equivalenceKey: diagnostic.Id + ":" + i),
                    diagnostic);
            }
        }

        return Task.CompletedTask;
    }

    private static async Task<Document> Replace(Document document, TextSpan span, string replacement, CancellationToken ct)
    {
        var text = await document.GetTextAsync(ct).ConfigureAwait(false);
        return document.WithText(text.Replace(span, replacement));
    }
}
