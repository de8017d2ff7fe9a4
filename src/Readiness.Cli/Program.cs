using Readiness.Cli;

return await new CliApp(CliConsole.System(), TimeProvider.System).RunAsync(args).ConfigureAwait(false);
