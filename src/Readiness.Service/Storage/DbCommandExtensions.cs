using System.Data.Common;

namespace Readiness.Service.Storage;

/// <summary>Parameters the same way for both stores (both providers take <c>@name</c>).</summary>
internal static class DbCommandExtensions
{
    public static DbCommand With(this DbCommand command, string name, object? value)
    {
        var parameter = command.CreateParameter();
        parameter.ParameterName = name;
        parameter.Value = value ?? DBNull.Value;
        command.Parameters.Add(parameter);
        return command;
    }

    public static long Long(this DbDataReader reader, int ordinal) => Convert.ToInt64(reader.GetValue(ordinal), System.Globalization.CultureInfo.InvariantCulture);

    public static long? NullableLong(this DbDataReader reader, int ordinal) => reader.IsDBNull(ordinal) ? null : reader.Long(ordinal);

    public static string? NullableString(this DbDataReader reader, int ordinal) => reader.IsDBNull(ordinal) ? null : reader.GetString(ordinal);
}
