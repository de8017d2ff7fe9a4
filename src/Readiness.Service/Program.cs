using Readiness.Service.Configuration;

namespace Readiness.Service;

/// <summary><c>dotnet run --project src/Readiness.Service</c>: listens on http://127.0.0.1:5080 unless told otherwise.</summary>
public sealed class Program
{
    private Program()
    {
    }

    public static async Task<int> Main(string[] args)
    {
        var app = ServiceApp.Build(args);
        try
        {
            await app.RunAsync().ConfigureAwait(false);
            return 0;
        }
        catch (ServiceConfigurationException e)
        {
            await Console.Error.WriteLineAsync("readiness service: " + e.Message).ConfigureAwait(false);
            return 2;
        }
    }
}
