package main

import (
	"io"
	"os"

	"github.com/spf13/cobra"
)

// Version is the tool version recorded in every manifest.
const Version = "0.1.0"

// Main runs the command line with os.Args and returns the exit code.
func Main() int { return run(os.Args[1:], os.Stdout, os.Stderr) }

// run executes one command line and maps its error to an exit code; it is
// the entry point tests call.
func run(args []string, stdout, stderr io.Writer) int {
	root := newRootCmd(stdout, stderr)
	root.SetArgs(args)
	// An unknown subcommand is found before anything runs: Find reports
	// it, so it is a usage error by where it arose, not by its wording.
	// Shell completion requests are cobra's own hidden command.
	root.InitDefaultHelpCmd()
	root.InitDefaultCompletionCmd(args...)
	if len(args) == 0 || (args[0] != cobra.ShellCompRequestCmd && args[0] != cobra.ShellCompNoDescRequestCmd) {
		if _, _, err := root.Find(args); err != nil {
			return report(usageError{err}, stderr)
		}
	}
	return report(root.Execute(), stderr)
}

func newRootCmd(stdout, stderr io.Writer) *cobra.Command {
	root := &cobra.Command{
		Use:   "coilwright",
		Short: "Turn a helical-antenna design spec into bench-ready parts and documents",
		Long: `coilwright takes one design spec (TOML) for a helical or conical-helix
antenna and produces what the bench needs: a springback-compensated winding
former to print, cut patterns for the reflector and matching wedge, a cut
list, a build sheet and a design report with the published estimates.`,
		SilenceUsage:  true,
		SilenceErrors: true,
		Version:       Version,
	}
	root.SetOut(stdout)
	root.SetErr(stderr)
	root.SetFlagErrorFunc(func(_ *cobra.Command, err error) error { return usageError{err} })
	for _, c := range commands() {
		root.AddCommand(c)
	}
	return root
}

// commands returns every subcommand; each lives in its own file.
func commands() []*cobra.Command {
	return []*cobra.Command{
		newNewCmd(),
		newCheckCmd(),
		newBuildCmd(),
		newMaterialsCmd(),
		newCalibrateCmd(),
	}
}
