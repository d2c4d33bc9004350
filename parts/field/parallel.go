package field

import (
	"runtime"
	"sync"
	"sync/atomic"
)

// parallel runs fn(0..n−1) on at most workers goroutines (zero:
// GOMAXPROCS; one: in order on the calling goroutine); each call writes
// only its own pre-indexed result, so the outcome does not depend on the
// cores.
func parallel(workers, n int, fn func(i int)) {
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	workers = min(workers, n)
	if workers <= 1 {
		for i := range n {
			fn(i)
		}
		return
	}
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
