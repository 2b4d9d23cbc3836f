using Integrable.Cli;

using var cts = new CancellationTokenSource();
Console.CancelKeyPress += (_, e) => { e.Cancel = true; cts.Cancel(); };
return CommandLineApp.Run(args, Console.Out, Console.Error, cts.Token);
