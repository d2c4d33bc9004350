package field

import (
	"runtime"
	"sync"
	"sync/atomic"
)

// parallel runs fn(0..n−1) on GOMAXPROCS goroutines; each call writes only
// its own pre-indexed result, so the outcome does not depend on the cores.
func parallel(n int, fn func(i int)) {
	workers := min(runtime.GOMAXPROCS(0), n)
	var next atomic.Int64
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for {
				i := int(next.Add(1)) - 1
				if i >= n {
					return
				}
				fn(i)
			}
		}()
	}
	wg.Wait()
}
