//go:build linux

package fe

import (
	"syscall"
	"unsafe"
)

// allocBand returns n zeroed float64s for the band matrix and a function
// that releases them. A large band is mapped directly and marked for
// transparent huge pages: first touching fresh memory page by page is a
// large part of a cold solve (measured on the 160 × 80 mesh's 34 MB band in
// this project's 2-core VM: about 100 ms with 4 KB pages, 5–60 ms with huge
// pages, against about 120 ms for the whole factorisation). The advice is
// only a hint; when the mapping fails, the band comes from the Go heap.
// The memory is not seen by the garbage collector: nothing may keep the
// slice after release.
func allocBand(n int) ([]float64, func()) {
	const direct = 4 << 20 // bytes; smaller bands come from the Go heap
	if n*8 < direct {
		return make([]float64, n), func() {}
	}
	mem, err := syscall.Mmap(-1, 0, n*8, syscall.PROT_READ|syscall.PROT_WRITE, syscall.MAP_ANON|syscall.MAP_PRIVATE)
	if err != nil {
		return make([]float64, n), func() {}
	}
	_ = syscall.Madvise(mem, syscall.MADV_HUGEPAGE)
	return unsafe.Slice((*float64)(unsafe.Pointer(&mem[0])), n), func() { _ = syscall.Munmap(mem) }
}
