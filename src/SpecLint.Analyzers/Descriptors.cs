using Microsoft.CodeAnalysis;

namespace SpecLint.Analyzers;

/// <summary>Builds descriptors the same way for every id: category, warning by default, help link to its page.</summary>
internal static class Descriptors
{
    public const string Category = "SpecLint.Units";

    public static DiagnosticDescriptor Warning(string id, string title, string message, string description) =>
        new(id, title, message, Category, DiagnosticSeverity.Warning, isEnabledByDefault: true,
            description: description, helpLinkUri: DiagnosticIds.HelpLink(id));
}
