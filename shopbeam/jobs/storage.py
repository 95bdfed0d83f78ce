"""Saving job files so that nothing is lost and nobody is overwritten.

Every write is atomic: the new text goes to a temp file in the same folder, is flushed and
fsynced, then renamed over the old file (and the folder is fsynced), so a crash or a kill
mid-save leaves either the old file or the new one, never a torn one. Writes to a folder
several people share (the shop library) hold a lock on the folder itself (flock on the
folder, so no lock file is ever left beside a job and any member of the folder's group who can
read the folder can take it), and a save remembers what the file
looked like when it was opened (`Opened`, a sha256 and mtime fingerprint): saving over a file
that someone changed since is refused with `SaveConflict`, which carries a unified diff of
what changed on disk so the caller can offer "save as a new name" or "overwrite after seeing
the changes". Saving to a name that already exists is refused (`NameTaken`) unless the caller
says overwrite; an overwrite after a conflict re-checks that the file is still what the user
reviewed. Names typed by users go through `safe_name`, so they cannot leave the folder.

Shared folders: a replaced file keeps its permission bits and its group; a new file in a
setgid folder gets the folder's group read/write bits; a read-only file (no write bit, or
not writable by this user) is refused with a message. A save through a symbolic link writes
the file it points to (the link stays a link). Only regular files are read: a FIFO or a device
named like a job is refused at once (stat before open, and the open never blocks). Temp files
of saves that were killed are removed by the next save or open in that folder, under the
folder lock and only when no live process holds them (each save holds an flock on its temp).
"""

from __future__ import annotations

import difflib
import hashlib
import os
import re
import secrets
import stat
import time
from contextlib import contextmanager
from dataclasses import dataclass
from pathlib import Path

from shopbeam.errors import InputError

try:  # POSIX; elsewhere saves are atomic but not locked
    import fcntl
except ImportError:  # pragma: no cover - Windows
    fcntl = None

SUFFIX = ".toml"
LOCK_TIMEOUT = 10.0  # seconds to wait for another writer before giving up
_CHUNK = 1 << 20
_TEMP_PREFIX = "."
_TEMP_SUFFIX = ".saving"

# Letters, digits, '-', '_' and '.' inside; starts with a letter or digit; at most 64 long.
_NAME_RE = re.compile(r"^[A-Za-z0-9][A-Za-z0-9._-]{0,63}$")
_WINDOWS_RESERVED = {"con", "prn", "aux", "nul"} | {f"com{i}" for i in range(1, 10)} | {
    f"lpt{i}" for i in range(1, 10)}


# --------------------------------------------------------------------------- names

def suggest_name(text: str) -> str:
    """A safe name close to what the user typed: 'Bay 3 / arm' -> 'bay-3-arm'."""
    stem = Path(str(text).replace("\\", "/")).name
    if stem.lower().endswith(SUFFIX):
        stem = stem[: -len(SUFFIX)]
    out = re.sub(r"[^A-Za-z0-9._-]+", "-", stem).strip("-._").lower()
    out = re.sub(r"\.{2,}", ".", out)
    out = out[:64] or "job"
    if out.split(".")[0] in _WINDOWS_RESERVED:
        out = out + "-job"
    return out


def safe_name(name: str, key: str = "name") -> str:
    """Check a job name a user typed and return its stem (without `.toml`).

    Refuses anything that could point outside the library folder or that shells and file
    systems handle badly: separators, `..`, absolute paths, drive letters, control or other
    odd characters, leading dots, reserved device names, and names over 64 characters.
    """
    raw = str(name) if name is not None else ""
    text = raw.strip()
    hint = (f"use letters, digits, '-', '_' and '.' only (at most 64), "
            f"for example '{suggest_name(raw)}'")
    if not text:
        raise InputError("a job name is required; " + hint, key=key)
    if os.path.isabs(text) or re.match(r"^[A-Za-z]:", text):
        raise InputError(f"the name '{raw}' is an absolute path; " + hint, key=key)
    if ".." in text:
        raise InputError(f"the name '{raw}' contains '..', which could point outside the "
                         "library folder; " + hint, key=key)
    if "/" in text or "\\" in text or os.sep in text or (os.altsep and os.altsep in text):
        raise InputError(f"the name '{raw}' contains a folder separator; a library name is "
                         "a plain name, not a path; " + hint, key=key)
    stem = text[: -len(SUFFIX)] if text.lower().endswith(SUFFIX) else text
    if not _NAME_RE.match(stem):
        odd = sorted({c for c in stem if not re.match(r"[A-Za-z0-9._-]", c)})
        why = (f"has characters that are not allowed ({' '.join(repr(c) for c in odd)})" if odd
               else "must start with a letter or digit and be at most 64 characters")
        raise InputError(f"the name '{raw}' {why}; " + hint, key=key)
    if stem.split(".")[0].lower() in _WINDOWS_RESERVED:
        raise InputError(f"the name '{raw}' is a reserved device name on Windows; " + hint,
                         key=key)
    return stem


def path_in(folder: str | os.PathLike, name: str, key: str = "name") -> Path:
    """The file for library name `name` inside `folder`, proven to stay inside it."""
    stem = safe_name(name, key=key)
    base = Path(folder).resolve()
    target = (base / (stem + SUFFIX)).resolve()
    if target.parent != base:  # a symlink or an odd file system; refuse rather than guess
        raise InputError(f"the name '{name}' resolves outside the library folder {base}",
                         key=key)
    return target


# --------------------------------------------------------------------------- fingerprints

@dataclass(frozen=True)
class Fingerprint:
    """What a file looked like: its content hash, modification time and size."""

    sha256: str
    mtime_ns: int
    size: int

    def same_content(self, other: "Fingerprint | None") -> bool:
        return other is not None and other.sha256 == self.sha256


@dataclass(frozen=True)
class Opened:
    """A file as it was read: its path, text and fingerprint (the base for a later save)."""

    path: Path
    text: str
    fingerprint: Fingerprint | None  # None: the file did not exist (a new file)


def _fingerprint_bytes(data: bytes, st: os.stat_result) -> Fingerprint:
    return Fingerprint(hashlib.sha256(data).hexdigest(), st.st_mtime_ns, st.st_size)


def _read(path: Path) -> tuple[bytes, Fingerprint] | None:
    """The file's bytes and fingerprint (None when it does not exist). Refuses anything but a
    regular file before reading it: a FIFO would block forever, a device would never end."""
    try:
        st = os.stat(path)
    except FileNotFoundError:
        return None
    _regular(path, st)
    flags = os.O_RDONLY | getattr(os, "O_NONBLOCK", 0) | getattr(os, "O_NOCTTY", 0)
    try:
        fd = os.open(path, flags)
    except FileNotFoundError:
        return None
    try:
        st = os.fstat(fd)
        _regular(path, st)  # the name may have been swapped since the stat
        if st.st_size > MAX_READ:
            raise InputError(f"the file is {st.st_size:,} bytes, more than a job file can be "
                             f"({MAX_READ:,}); is it the right file?", file=str(path))
        with os.fdopen(fd, "rb", closefd=False) as f:
            data = f.read(MAX_READ + 1)
    finally:
        os.close(fd)
    return data, _fingerprint_bytes(data, st)


MAX_READ = 16_000_000  # bytes; the job reader refuses far smaller files with its own limit


def _regular(path: Path, st: os.stat_result) -> None:
    if stat.S_ISDIR(st.st_mode):
        raise InputError("this is a folder, not a job file", file=str(path))
    if not stat.S_ISREG(st.st_mode):
        kind = ("a named pipe (FIFO)" if stat.S_ISFIFO(st.st_mode) else
                "a device" if stat.S_ISCHR(st.st_mode) or stat.S_ISBLK(st.st_mode) else
                "a socket" if stat.S_ISSOCK(st.st_mode) else "not a regular file")
        raise InputError(f"this is {kind}, not a job file; give the path of a saved job "
                         "(a plain text .toml file)", file=str(path))


def read_bytes(path: str | os.PathLike) -> bytes:
    """A job file's bytes: regular files only (InputError otherwise, never a hang).
    Raises FileNotFoundError when there is no such file."""
    p = Path(path)
    try:
        got = _read(p)
    except PermissionError:
        raise InputError("cannot read the file (permission denied)", file=str(p)) from None
    if got is None:
        raise FileNotFoundError(2, "no such file", str(p))
    return got[0]


def fingerprint(path: str | os.PathLike) -> Fingerprint | None:
    """The file's fingerprint now, or None when it does not exist."""
    got = _read(Path(path))
    return got[1] if got else None


def _decode(data: bytes, path: Path) -> str:
    try:
        return data.decode("utf-8")
    except UnicodeDecodeError as exc:
        raise InputError(f"the file is not UTF-8 text (byte {exc.start}); save it as UTF-8",
                         file=str(path)) from None


def open_text(path: str | os.PathLike) -> Opened:
    """Read a job file and remember its fingerprint for conflict detection on save.

    Also tidies the folder: temp files of saves killed earlier are removed (see
    `clean_stale_temps`) when the folder lock is free."""
    p = Path(path)
    try:
        tidy(p.parent)
    except OSError:
        pass
    try:
        got = _read(p)
    except IsADirectoryError:
        raise InputError("this is a folder, not a job file", file=str(p)) from None
    except PermissionError:
        raise InputError("cannot read the file (permission denied)", file=str(p)) from None
    if got is None:
        raise InputError("no such file", file=str(p))
    data, fp = got
    return Opened(p, _decode(data, p), fp)


# --------------------------------------------------------------------------- conflicts

class SaveConflict(Exception):
    """A save was refused because the file on disk is not what the caller expects.

    `reason` is "changed" (someone changed the file since it was opened), "deleted"
    (someone removed it since) or "exists" (saving a new file to a name that is taken).
    `diff` is a unified diff from the text the caller opened to the text on disk now
    (for "exists", from the file on disk to the text that would replace it). The caller can
    offer to save under a
    new name, or to overwrite after the user has seen the diff (`overwrite=True`).
    """

    def __init__(self, path: Path, reason: str, diff: str, on_disk: str | None,
                 on_disk_fingerprint: Fingerprint | None):
        self.path = Path(path)
        self.reason = reason
        self.diff = diff
        self.on_disk = on_disk
        self.on_disk_fingerprint = on_disk_fingerprint
        super().__init__(self.message())

    def message(self) -> str:
        if self.reason == "exists":
            what = "a job with this name already exists"
        elif self.reason == "deleted":
            what = "the file was deleted by someone else since you opened it"
        else:
            what = "the file was changed by someone else since you opened it"
        return (f"{self.path}: not saved: {what}. Save under a new name, or overwrite "
                "after reviewing what changed.")

    def __str__(self) -> str:
        return self.message() + ("\n" + self.diff if self.diff else "")


class NameTaken(SaveConflict):
    """Saving a new file to a name that already exists (refused unless overwrite)."""


def unified_diff(old: str, new: str, old_label: str, new_label: str) -> str:
    lines = difflib.unified_diff(old.splitlines(keepends=True), new.splitlines(keepends=True),
                                 fromfile=old_label, tofile=new_label)
    out = []
    for line in lines:
        out.append(line if line.endswith("\n") else line + "\n\\ No newline at end of file\n")
    return "".join(out)


# --------------------------------------------------------------------------- locking



def lock_path(path: str | os.PathLike) -> Path:
    """What is locked for a save of `path`: its folder (flock on the folder itself)."""
    p = Path(path)
    return p.parent if str(p.parent) else Path(".")


_held: dict[tuple[int, int], list] = {}  # folder (dev, inode) -> [fd, depth]: reentrant


def _open_folder(folder: Path) -> int:
    return os.open(folder, os.O_RDONLY | getattr(os, "O_DIRECTORY", 0))


@contextmanager
def locked(path: str | os.PathLike, timeout: float | None = None, *, wait: bool = True):
    """Hold the write lock of `path`'s folder while inside.

    The lock is an flock on the folder itself: nothing is created, so any user who can read
    the folder can take it (a shared shop folder needs no group-writable lock file), and no
    lock file is ever left beside a job. Reentrant within a process. `wait=False` yields
    False at once when another process holds it (for tidying, which can wait).
    """
    folder = lock_path(path)
    timeout = LOCK_TIMEOUT if timeout is None else timeout
    if fcntl is None:  # pragma: no cover
        yield True
        return
    try:
        fd = _open_folder(folder)
    except FileNotFoundError:
        raise InputError("the folder does not exist", file=str(folder)) from None
    except PermissionError:
        raise InputError("cannot open the folder (permission denied)",
                         file=str(folder)) from None
    st = os.fstat(fd)
    key = (st.st_dev, st.st_ino)
    if key in _held:
        os.close(fd)
        _held[key][1] += 1
        try:
            yield True
        finally:
            _held[key][1] -= 1
        return
    deadline = time.monotonic() + timeout
    got = False
    try:
        while True:
            try:
                fcntl.flock(fd, fcntl.LOCK_EX | fcntl.LOCK_NB)
                got = True
                break
            except BlockingIOError:
                if not wait:
                    break
                if time.monotonic() >= deadline:
                    raise InputError(f"someone else is saving in this folder right now (its lock "
                                     f"held for over {timeout:g} s); try again in a moment",
                                     file=str(path)) from None
                time.sleep(0.02)
        if not got:
            yield False
            return
        _held[key] = [fd, 1]
        try:
            yield True
        finally:
            del _held[key]
    finally:
        os.close(fd)  # closing the folder releases the flock


# --------------------------------------------------------------------------- writing

def _fsync_dir(folder: Path) -> None:
    try:
        fd = os.open(folder, os.O_RDONLY)
    except OSError:  # not every platform can open a folder (Windows); the rename stands
        return
    try:
        os.fsync(fd)
    except OSError:
        pass
    finally:
        os.close(fd)


def _new_file_mode(existing: Path, folder: Path) -> tuple[int, int]:
    """(mode, group) for the file that replaces `existing`: the old file's mode and group,
    or for a new file the umask's mode (plus the folder's group read/write bits when the
    folder is setgid, as shared folders are) and -1 (the group the system gives)."""
    try:
        st = os.stat(existing)
        return st.st_mode & 0o7777 & ~(stat.S_ISUID | stat.S_ISGID), st.st_gid
    except FileNotFoundError:
        umask = os.umask(0)
        os.umask(umask)
        mode = 0o666 & ~umask
        try:
            fst = os.stat(folder)
            if fst.st_mode & stat.S_ISGID:
                mode |= fst.st_mode & 0o060
        except OSError:
            pass
        return mode, -1


def refuse_read_only(path: Path) -> None:
    """InputError when the file exists and may not be written (no write bit for anyone, or
    not writable by this user): a replace would otherwise silently defeat the permission."""
    try:
        st = os.stat(path)
    except FileNotFoundError:
        return
    if not stat.S_ISREG(st.st_mode):
        _regular(path, st)
    if st.st_mode & 0o222 == 0 or not os.access(path, os.W_OK):
        raise InputError(f"the file is read-only (mode {stat.S_IMODE(st.st_mode):04o}); not "
                         "saved. Save under a new name, or make it writable first "
                         "(chmod u+w, or ask its owner)", file=str(path))


def real_target(path: str | os.PathLike) -> Path:
    """The file a save to `path` must write: through a symbolic link, the file it points to
    (replacing the link itself would leave the edit in the wrong place)."""
    p = Path(path)
    if p.is_symlink():
        return Path(os.path.realpath(p))
    return p


def atomic_write(path: str | os.PathLike, text: str | bytes) -> Fingerprint:
    """Write `text` to `path` atomically and durably; return the new file's fingerprint.

    Temp file in the same folder (created under the folder lock and held with an flock until
    it is renamed, so a tidy-up never takes a live one), written in full, flushed and
    fsynced, then `os.replace`d over the target and the folder fsynced. A kill at any point
    leaves the old file whole (at worst a `.NAME.*.saving` temp file, removed by the next
    save or open there). Keeps the old file's permission bits and group. A symbolic link is
    followed: the file it points to is replaced, the link stays.
    """
    p = real_target(path)
    folder = p.parent if str(p.parent) else Path(".")
    data = text.encode("utf-8") if isinstance(text, str) else bytes(text)
    mode, group = _new_file_mode(p, folder)
    with locked(p):
        try:
            fd, tmp = _new_temp(folder, p.name, mode)
        except PermissionError as e:
            shown = f" (the name is a link to {p})" if p != Path(path) else ""
            raise InputError(f"cannot save: the folder {folder} is not writable for you"
                             f"{shown} ({e.strerror}). Nothing was changed; save it in a "
                             "folder you may write, or ask the folder's owner",
                             file=str(path)) from None
        try:
            if fcntl is not None:
                fcntl.flock(fd, fcntl.LOCK_EX)
            if hasattr(os, "fchmod"):
                os.fchmod(fd, mode)
            if group != -1 and hasattr(os, "fchown"):
                try:
                    os.fchown(fd, -1, group)
                except OSError:  # not a member of the old file's group: keep ours
                    pass
                os.fchmod(fd, mode)  # a group change can clear setgid-style bits
            view = memoryview(data)
            while view:
                n = os.write(fd, view[:_CHUNK])
                view = view[n:]
            os.fsync(fd)
            os.replace(tmp, p)
            os.close(fd)
            fd = -1
        except BaseException:
            if fd >= 0:
                os.close(fd)
            try:
                os.unlink(tmp)
            except OSError:
                pass
            raise
    _fsync_dir(folder)
    st = os.stat(p)
    return _fingerprint_bytes(data, st)


def _new_temp(folder: Path, name: str, mode: int) -> tuple[int, str]:
    """A new temp file beside `name`, created with the saved file's own mode (less the
    umask) rather than 0600: killed before its mode is set, the temp can still be opened, and
    so tidied, by the folder's other members (`clean_stale_temps` must open it to see that no
    save holds it)."""
    flags = os.O_RDWR | os.O_CREAT | os.O_EXCL | getattr(os, "O_NOFOLLOW", 0) \
        | getattr(os, "O_CLOEXEC", 0)
    for _ in range(100):
        tmp = os.path.join(folder, f"{_TEMP_PREFIX}{name}.{secrets.token_hex(4)}{_TEMP_SUFFIX}")
        try:
            return os.open(tmp, flags, mode & 0o7777), tmp
        except FileExistsError:
            continue
    raise FileExistsError(f"no free temp name beside {name} in {folder}")


def clean_stale_temps(folder: str | os.PathLike, older_than: float = 0.0) -> list[Path]:
    """Remove temp files left by saves that were killed (and older versions' lock files).

    Runs under the folder lock. A temp is removed only when no live process holds its flock
    (a save holds it from creation to rename, and the temps are created under the folder
    lock, so one we can lock is dead) and it is the same file we checked; a temp we cannot
    open (another user's, unreadable to us) must also be over an hour old. `older_than`
    adds an age floor in seconds.
    """
    removed: list[Path] = []
    base = Path(folder)
    with locked(base / "x", wait=False) as got:
        if not got:
            return removed  # someone is saving now: tidy next time
        now = time.time()
        stale = list(base.glob(f"{_TEMP_PREFIX}*{_TEMP_SUFFIX}"))
        stale += list(base.glob(f"{_TEMP_PREFIX}*{SUFFIX}.lock"))  # older versions' locks
        for tmp in stale:
            try:
                st = os.lstat(tmp)
                if not stat.S_ISREG(st.st_mode) or now - st.st_mtime < older_than:
                    continue
                try:
                    fd = os.open(tmp, os.O_RDONLY | getattr(os, "O_NOFOLLOW", 0)
                                 | getattr(os, "O_NONBLOCK", 0))
                except PermissionError:
                    if now - st.st_mtime > 3600:
                        tmp.unlink()
                        removed.append(tmp)
                    continue
                try:
                    if fcntl is not None:
                        try:
                            fcntl.flock(fd, fcntl.LOCK_EX | fcntl.LOCK_NB)
                        except BlockingIOError:
                            continue  # a live save
                    fst = os.fstat(fd)
                    now_st = os.lstat(tmp)
                    if (fst.st_dev, fst.st_ino) == (now_st.st_dev, now_st.st_ino):
                        tmp.unlink()
                        removed.append(tmp)
                finally:
                    os.close(fd)
            except OSError:
                pass
    return removed


def tidy(folder: Path) -> None:
    """Best-effort tidy-up of a folder being saved to or opened from."""
    if folder.is_dir() and os.access(folder, os.W_OK):
        clean_stale_temps(folder)


def _resolve_overwrite(overwrite) -> tuple[bool, object]:
    """overwrite is False, True (replace whatever is there) or the SaveConflict the user
    reviewed (replace only if the file is still what it showed)."""
    if isinstance(overwrite, SaveConflict):
        return True, overwrite
    return bool(overwrite), None


def save_text(path: str | os.PathLike, text: str, base: Opened | None = None, *,
              overwrite=False, lock: bool = True) -> Opened:
    """Save `text` to `path` and return the new `Opened` (the base for the next save).

    base None: `path` must not exist yet (else `NameTaken`) unless `overwrite`.
    base given: the file on disk must still have the content it had when `base` was read
    (else `SaveConflict` with a diff), unless `overwrite` (the user saw the changes). A file
    whose mtime changed but whose content did not is not a conflict: nothing would be lost.
    `overwrite` may be the SaveConflict the user reviewed: then the file must still be what
    it showed (a third person's change made meanwhile is a new conflict, not lost unseen).
    The check and the write happen under the folder lock, so two savers cannot both pass
    the check and then overwrite each other. A read-only file is refused (InputError).
    """
    p = Path(path)
    real = real_target(p)
    if base is None and real != p:
        # a new job written over a name that is a link would replace the file the link
        # points to, which may be anyone's, anywhere: never through a link
        raise InputError(f"{p} is a symbolic link to {real}: a new job is not written "
                         "through it (that would replace the file it points to). Remove the "
                         "link, or give another name", file=str(p))
    force, reviewed = _resolve_overwrite(overwrite)
    ctx = locked(real) if lock else _nolock()
    with ctx:
        tidy(real.parent)
        refuse_read_only(real)
        if reviewed is not None:
            _check_reviewed(real, reviewed)
        elif not force:
            _check(real, base, text)
        fp = atomic_write(real, text)
    return Opened(p, text, fp)


def _check_reviewed(p: Path, conflict: "SaveConflict") -> None:
    got = _read(p)
    seen = conflict.on_disk_fingerprint
    now = got[1] if got else None
    if (seen is None) != (now is None) or (seen is not None and not seen.same_content(now)):
        on_disk = got[0].decode("utf-8", "replace") if got else None
        raise SaveConflict(p, "changed" if got else "deleted",
                           unified_diff(conflict.on_disk or "", on_disk or "",
                                        f"{p} (when you reviewed it)", f"{p} (on disk now)"),
                           on_disk, now)


def update_text(path: str | os.PathLike, change, *, create: str | None = None) -> Opened:
    """Read-modify-write under the lock: `change(old_text) -> new_text`, saved atomically.

    For edits several people may make at once (no lost update). `create` is the text to
    start from when the file does not exist yet (else the missing file is an error).
    """
    p = real_target(path)
    with locked(p):
        tidy(p.parent)
        refuse_read_only(p)
        got = _read(p)
        if got is None:
            if create is None:
                raise InputError("no such file", file=str(p))
            old = create
        else:
            old = _decode(got[0], p)
        new = change(old)
        fp = atomic_write(p, new)
    return Opened(Path(path), new, fp)


@contextmanager
def _nolock():
    yield


def _check(p: Path, base: Opened | None, text: str | None = None) -> None:
    got = _read(p)
    if base is None or base.fingerprint is None:
        if got is not None:
            on_disk = got[0].decode("utf-8", "replace")
            # what overwriting would change: the file there now against the text to write
            diff = (unified_diff(on_disk, text, f"{p} (on disk now)", f"{p} (yours)")
                    if text is not None else unified_diff("", on_disk, "/dev/null", str(p)))
            raise NameTaken(p, "exists", diff, on_disk, got[1])
        return
    if got is None:
        raise SaveConflict(p, "deleted", unified_diff(base.text, "", f"{p} (when opened)",
                                                      "/dev/null"), None, None)
    if not base.fingerprint.same_content(got[1]):
        on_disk = got[0].decode("utf-8", "replace")
        raise SaveConflict(p, "changed",
                           unified_diff(base.text, on_disk, f"{p} (when opened)",
                                        f"{p} (on disk now)"), on_disk, got[1])
