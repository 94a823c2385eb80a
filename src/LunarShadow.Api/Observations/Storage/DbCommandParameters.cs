using System.Data.Common;

namespace LunarShadow.Api.Observations.Storage;

/// <summary>Named parameters on a command (@name in the SQL of both dialects).</summary>
internal static class DbCommandParameters
{
    /// <summary>Adds a parameter; null becomes SQL NULL.</summary>
    public static DbCommand AddParameter(this DbCommand command, string name, object? value)
    {
        var parameter = command.CreateParameter();
        parameter.ParameterName = name;
        parameter.Value = value ?? DBNull.Value;
        command.Parameters.Add(parameter);
        return command;
    }
}
