// Command coilwright turns one helical-antenna design spec into everything
// the bench needs: a winding former, cut patterns, a cut list, a build
// sheet and a design report.
package main

import "os"

func main() { os.Exit(Main()) }
