// Linked into the static `plumb` only (cli/CMakeLists.txt wraps the two symbols below).
//
// A static link starts from crtbeginT.o, which registers the program's unwind tables with
// libgcc at start-up, and gcc gives a static link no .eh_frame_hdr search table. The first
// exception thrown (an undeclared name, a syntax error, an exponent overflow: any file with a
// finding of those kinds) then makes libgcc sort every frame description in the program, about
// 23 million instructions, which doubled the time of a one-formula check with an error. With
// the registration turned into a no-op and the table linked in (--eh-frame-hdr), libgcc finds
// frames by a binary search of that table through dl_iterate_phdr, as in a dynamic program.

extern "C" {

// Stands in for libgcc's __register_frame_info: registers nothing.
void __wrap___register_frame_info(const void* /*eh_frame_begin*/, void* /*object*/) {}

// Stands in for libgcc's __deregister_frame_info, which would assert that the object it is
// asked to drop was registered; nothing was.
void* __wrap___deregister_frame_info(const void* /*eh_frame_begin*/) {
    return nullptr;
}
}
