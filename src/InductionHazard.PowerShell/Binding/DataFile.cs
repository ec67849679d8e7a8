using System.Collections;
using System.IO;
using System.Linq;
using System.Management.Automation;
using System.Management.Automation.Language;
using InductionHazard.Errors;

namespace InductionHazard.PowerShell.Binding;

/// <summary>
/// Reads a PowerShell data file as data: the file is parsed, never run, and its one hashtable is turned into
/// values only where it holds nothing but literals (SafeGetValue, the method Import-PowerShellDataFile uses), so a
/// file with a command, a variable or a script block in it is refused.
/// </summary>
internal static class DataFile
{
    /// <summary>The file's top-level hashtable.</summary>
    /// <exception cref="DataFileException">The file is missing, does not parse, is not one hashtable, or holds code.</exception>
    public static IDictionary Read(string path, string errorId)
    {
        if (!File.Exists(path))
        {
            throw new DataFileException(path, null, "the file does not exist", errorId);
        }

        ScriptBlockAst ast = Parser.ParseFile(path, out _, out ParseError[] errors);
        if (errors.Length > 0)
        {
            throw new DataFileException(path, errors[0].Extent.StartLineNumber, "does not parse: " + errors[0].Message, errorId);
        }

        var hashtable = ast.Find(a => a is HashtableAst, false) as HashtableAst;
        bool onlyTheTable = hashtable is not null && ast.EndBlock is { } end && end.Statements.Count == 1 && ast.BeginBlock is null && ast.ProcessBlock is null;
        if (!onlyTheTable)
        {
            throw new DataFileException(path, null, "a data file holds one hashtable @{ ... } and nothing else", errorId);
        }

        try
        {
            return (IDictionary)hashtable!.SafeGetValue();
        }
        catch (System.InvalidOperationException ex)
        {
            Ast? code = hashtable!.Find(a => a is CommandAst or VariableExpressionAst or ScriptBlockExpressionAst or InvokeMemberExpressionAst or SubExpressionAst, true);
            int? line = code?.Extent.StartLineNumber;
            throw new DataFileException(path, line, "holds code (" + (code?.Extent.Text.Split('\n').First().Trim() ?? ex.Message) + "); a data file is read as data and may hold only literal values", errorId);
        }
    }
}
