package kit

import (
	"crypto/sha256"
	"encoding/hex"
	"hash"
	"io"
)

// recorder is a Sink that passes every file on to another sink and
// remembers its name, size and SHA-256, and the bytes of the files the
// report page embeds, so a later step can list and embed what earlier
// steps wrote.
type recorder struct {
	next  Sink
	files []recordedFile
	keep  map[string][]byte
}

// recordedFile is one file a build wrote, as the sink saw it.
type recordedFile struct {
	Name   string
	Size   int64
	SHA256 string
}

// keptFiles are the files whose bytes the recorder keeps for the report
// page.
var keptFiles = map[string]bool{"former.png": true}

// Add passes the file on, counting and hashing its bytes on the way.
func (r *recorder) Add(name string, write func(io.Writer) error) error {
	var h hash.Hash = sha256.New()
	var n int64
	var kept []byte
	err := r.next.Add(name, func(w io.Writer) error {
		tee := &teeWriter{w: w, h: h, n: &n}
		if keptFiles[name] {
			tee.keep = &kept
		}
		return write(tee)
	})
	if err != nil {
		return err
	}
	r.files = append(r.files, recordedFile{Name: name, Size: n, SHA256: hex.EncodeToString(h.Sum(nil))})
	if kept != nil {
		if r.keep == nil {
			r.keep = map[string][]byte{}
		}
		r.keep[name] = kept
	}
	return nil
}

// teeWriter writes to w and feeds the same bytes to a hash, a counter and,
// when keep is set, a copy.
type teeWriter struct {
	w    io.Writer
	h    hash.Hash
	n    *int64
	keep *[]byte
}

func (t *teeWriter) Write(p []byte) (int, error) {
	n, err := t.w.Write(p)
	t.h.Write(p[:n])
	*t.n += int64(n)
	if t.keep != nil {
		*t.keep = append(*t.keep, p[:n]...)
	}
	return n, err
}
