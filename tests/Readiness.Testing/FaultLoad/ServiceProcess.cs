using System.Diagnostics;
using System.Net;
using System.Net.Sockets;

namespace Readiness.Testing.FaultLoad;

/// <summary>One service instance as its own process (so it can be killed with SIGKILL), on a fixed 127.0.0.1 port.</summary>
public sealed class ServiceProcess : IDisposable
{
    private readonly string dll;
    private readonly IReadOnlyDictionary<string, string> environment;
    private Process? process;

    public ServiceProcess(string serviceDll, IReadOnlyDictionary<string, string> environment)
    {
        dll = serviceDll;
        this.environment = environment;
        using var probe = new TcpListener(IPAddress.Loopback, 0);
        probe.Start();
        Port = ((IPEndPoint)probe.LocalEndpoint).Port;
        probe.Stop();
    }

    public int Port { get; }

    public Uri Url => new($"http://127.0.0.1:{Port}/");

    public bool Running => process is { HasExited: false };

    /// <summary>Starts the process and waits until <c>/healthz</c> answers.</summary>
    public async Task StartAsync(HttpClient client, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(client);
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(dll);
        start.ArgumentList.Add($"--urls=http://127.0.0.1:{Port}");
        foreach (var (key, value) in environment)
        {
            start.Environment[key] = value;
        }

        process = Process.Start(start) ?? throw new InvalidOperationException("the service did not start");
        process.OutputDataReceived += (_, _) => { };
        process.ErrorDataReceived += (_, _) => { };
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        var until = DateTime.UtcNow.AddSeconds(90);
        while (DateTime.UtcNow < until)
        {
            if (process.HasExited)
            {
                throw new InvalidOperationException($"the service exited with {process.ExitCode} while starting");
            }

            try
            {
                using var answer = await client.GetAsync(new Uri(Url, "healthz"), cancellationToken).ConfigureAwait(false);
                if (answer.IsSuccessStatusCode)
                {
                    return;
                }
            }
            catch (HttpRequestException)
            {
                // Not listening yet.
            }

            await Task.Delay(100, cancellationToken).ConfigureAwait(false);
        }

        throw new TimeoutException("the service did not answer /healthz within 90 s");
    }

    /// <summary>SIGKILL: no shutdown code runs, leases are left to run out.</summary>
    public void Kill()
    {
        if (process is { HasExited: false } p)
        {
            p.Kill(entireProcessTree: false);
            p.WaitForExit(10_000);
        }
    }

    public void Dispose()
    {
        Kill();
        process?.Dispose();
    }
}
