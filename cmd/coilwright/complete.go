package main

import (
	"strings"

	"github.com/spf13/cobra"

	"coilwright/parts/wire"
	"coilwright/templates"
)

// completeMaterials completes a wire material ID from the library.
func completeMaterials(_ *cobra.Command, _ []string, prefix string) ([]string, cobra.ShellCompDirective) {
	var out []string
	for _, id := range wire.MaterialIDs() {
		if strings.HasPrefix(id, prefix) {
			out = append(out, id)
		}
	}
	return out, cobra.ShellCompDirectiveNoFileComp
}

// completeDemos completes the name of an embedded demo spec, without its
// .toml (both forms are accepted).
func completeDemos(_ *cobra.Command, _ []string, prefix string) ([]string, cobra.ShellCompDirective) {
	var out []string
	for _, d := range templates.Demos() {
		if name := strings.TrimSuffix(d, ".toml"); strings.HasPrefix(name, prefix) {
			out = append(out, name)
		}
	}
	return out, cobra.ShellCompDirectiveNoFileComp
}

// completeSpecFile completes a spec argument with TOML files.
func completeSpecFile(_ *cobra.Command, args []string, _ string) ([]string, cobra.ShellCompDirective) {
	if len(args) > 0 {
		return nil, cobra.ShellCompDirectiveNoFileComp
	}
	return []string{"toml"}, cobra.ShellCompDirectiveFilterFileExt
}

// completeMaterialArg completes the one material ID materials takes.
func completeMaterialArg(cmd *cobra.Command, args []string, prefix string) ([]string, cobra.ShellCompDirective) {
	if len(args) > 0 {
		return nil, cobra.ShellCompDirectiveNoFileComp
	}
	return completeMaterials(cmd, args, prefix)
}
