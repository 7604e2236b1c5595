using System.CommandLine;
using SpecLint.Core.Spec.Schema;

namespace SpecLint.Cli.Commands;

/// <summary><c>speclint schema</c>: prints the JSON Schema of spec files (or of the repository configuration).</summary>
internal static class SchemaCommand
{
    public static Command Create()
    {
        var config = new Option<bool>("--config") { Description = "Print the schema of .speclint.yaml instead of spec files" };
        var command = new Command("schema", "Print the JSON Schema (draft-07) for spec files, for editors and other tools") { config };
        command.SetAction(parse =>
        {
            var text = parse.GetValue(config) ? ConfigSchema.Text : SpecSchema.Text;
            parse.InvocationConfiguration.Output.Write(text.EndsWith('\n') ? text : text + "\n");
            return 0;
        });
        return command;
    }
}
