using System.Reflection;
using PublicApiGenerator;

namespace SpecLint.HouseRules.Tests;

/// <summary>
/// The public surface of SpecLint.Core and SpecLint.Rules is the API house rules compile against. Any change to
/// it must be reviewed: the test fails, writes the new surface as <c>*.received.txt</c> beside the approved file,
/// and the change is accepted by copying it over the approved one.
/// </summary>
public sealed class RuleApiApprovalTests
{
    [Theory]
    [InlineData("SpecLint.Core")]
    [InlineData("SpecLint.Rules")]
    public void The_rule_api_has_not_changed_without_review(string assemblyName)
    {
        var assembly = Assembly.Load(assemblyName);
        var api = assembly.GeneratePublicApi(new ApiGeneratorOptions { IncludeAssemblyAttributes = false }).ReplaceLineEndings("\n");
        var folder = Path.Combine(RepoPaths.Root, "tests", "SpecLint.HouseRules.Tests", "Approved");
        var approvedPath = Path.Combine(folder, assemblyName + ".approved.txt");
        var receivedPath = Path.Combine(folder, assemblyName + ".received.txt");
        var approved = File.Exists(approvedPath) ? File.ReadAllText(approvedPath).ReplaceLineEndings("\n") : "";

        if (approved != api)
        {
            File.WriteAllText(receivedPath, api);
            Assert.Fail($"The public API of {assemblyName} changed. Review {receivedPath} and, if the change is intended, copy it over {approvedPath}.");
        }

        File.Delete(receivedPath);
    }
}
