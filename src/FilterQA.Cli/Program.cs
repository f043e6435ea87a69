using FilterQA.Cli;

return CliApplication.Run(args, Console.Out, Console.Error);
