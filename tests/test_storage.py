"""Saving job files: atomic under a kill, conflicts refused with a diff, names kept inside
the library folder, and two processes writing the shop library at once lose nothing."""

from __future__ import annotations

import os
import signal
import subprocess
import sys
import textwrap
import time

import pytest

from shopbeam.jobs import storage
from shopbeam.errors import InputError

OLD = 'schema = 1\ntitle = "old text"\n'


def _child(code: str, *args: str) -> subprocess.Popen:
    """A Python child running `code`, with stdout piped (it prints READY when in place)."""
    return subprocess.Popen([sys.executable, "-c", textwrap.dedent(code), *args],
                            stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)


def _wait_ready(proc: subprocess.Popen, timeout: float = 20.0) -> None:
    line = proc.stdout.readline()
    assert line.strip() == "READY", (line, proc.stderr.read() if proc.poll() is not None else "")


# ------------------------------------------------------------------ atomic save under a kill

KILL_MID_WRITE = """
    import os, sys, time
    from shopbeam.jobs import storage
    real_write = os.write
    calls = []
    def slow_write(fd, data):
        calls.append(1)
        if len(calls) == 2:                # one chunk of the new text is on disk: stop here
            print("READY", flush=True)
            time.sleep(60)
        return real_write(fd, data)
    os.write = slow_write
    storage.atomic_write(sys.argv[1], "x" * (5 * 1024 * 1024))   # several 1 MiB chunks
"""

KILL_BEFORE_RENAME = """
    import os, sys, time
    from shopbeam.jobs import storage
    real_replace = os.replace
    def stalled_replace(src, dst):
        print("READY", flush=True)          # temp file written and fsynced, not yet renamed
        time.sleep(60)
        return real_replace(src, dst)
    os.replace = stalled_replace
    storage.save_text(sys.argv[1], "new text\\n" * 1000, None, overwrite=True)
"""


@pytest.mark.parametrize("code", [KILL_MID_WRITE, KILL_BEFORE_RENAME],
                         ids=["killed-mid-write", "killed-before-rename"])
def test_sigkill_mid_save_leaves_old_file_intact(tmp_path, code):
    target = tmp_path / "job.toml"
    target.write_text(OLD, encoding="utf-8")
    proc = _child(code, str(target))
    try:
        _wait_ready(proc)
        # the save is in progress: a temp file exists beside the target
        temps = list(tmp_path.glob(".job.toml.*.saving"))
        assert len(temps) == 1 and temps[0].stat().st_size > 0
        os.kill(proc.pid, signal.SIGKILL)
        proc.wait(timeout=10)
    finally:
        if proc.poll() is None:
            proc.kill()
        proc.stdout.close()
        proc.stderr.close()
    assert proc.returncode == -signal.SIGKILL
    assert target.read_text(encoding="utf-8") == OLD
    # the stale temp file is left behind and is cleaned up later; listings skip it
    assert storage.clean_stale_temps(tmp_path, older_than=0.0) == temps
    assert not list(tmp_path.glob("*.saving")) and target.read_text(encoding="utf-8") == OLD


def test_atomic_write_replaces_whole_file_and_keeps_mode(tmp_path):
    target = tmp_path / "job.toml"
    target.write_text(OLD, encoding="utf-8")
    os.chmod(target, 0o640)
    fp = storage.atomic_write(target, "new\n")
    assert target.read_text(encoding="utf-8") == "new\n"
    assert fp == storage.fingerprint(target)
    assert target.stat().st_mode & 0o777 == 0o640
    assert [p.name for p in tmp_path.iterdir()] == ["job.toml"]  # no temp left on success


def test_failed_write_removes_temp_and_keeps_old(tmp_path, monkeypatch):
    target = tmp_path / "job.toml"
    target.write_text(OLD, encoding="utf-8")

    def disk_full(fd):
        raise OSError(28, "No space left on device")

    monkeypatch.setattr(storage.os, "fsync", disk_full)
    with pytest.raises(OSError):
        storage.atomic_write(target, "new\n")
    assert target.read_text(encoding="utf-8") == OLD
    assert [p.name for p in tmp_path.iterdir()] == ["job.toml"]


# ------------------------------------------------------------------ conflicts

def test_save_over_file_changed_since_opened_is_refused_with_diff(tmp_path):
    target = tmp_path / "job.toml"
    target.write_text('title = "a"\nvalue = "-300 lbf"\n', encoding="utf-8")
    mine = storage.open_text(target)
    # someone else on the shop server edits the file
    storage.atomic_write(target, 'title = "a"\nvalue = "-450 lbf"\n')
    with pytest.raises(storage.SaveConflict) as info:
        storage.save_text(target, 'title = "b"\nvalue = "-300 lbf"\n', mine)
    exc = info.value
    assert exc.reason == "changed" and not isinstance(exc, storage.NameTaken)
    assert '-value = "-300 lbf"' in exc.diff and '+value = "-450 lbf"' in exc.diff
    assert "(when opened)" in exc.diff and "(on disk now)" in exc.diff
    assert 'value = "-450 lbf"' in target.read_text(encoding="utf-8")  # theirs kept
    # "overwrite after seeing the changes"
    again = storage.save_text(target, 'title = "b"\n', mine, overwrite=True)
    assert target.read_text(encoding="utf-8") == 'title = "b"\n'
    # the new Opened is the base for the next save: saving again is fine
    storage.save_text(target, 'title = "c"\n', again)
    assert target.read_text(encoding="utf-8") == 'title = "c"\n'


def test_touch_without_change_is_not_a_conflict(tmp_path):
    target = tmp_path / "job.toml"
    target.write_text(OLD, encoding="utf-8")
    mine = storage.open_text(target)
    later = time.time() + 100
    os.utime(target, (later, later))
    assert storage.fingerprint(target).mtime_ns != mine.fingerprint.mtime_ns
    storage.save_text(target, "ok\n", mine)  # same content: nothing of theirs is lost
    assert target.read_text(encoding="utf-8") == "ok\n"


def test_save_over_file_deleted_since_opened_is_refused(tmp_path):
    target = tmp_path / "job.toml"
    target.write_text(OLD, encoding="utf-8")
    mine = storage.open_text(target)
    target.unlink()
    with pytest.raises(storage.SaveConflict) as info:
        storage.save_text(target, "new\n", mine)
    assert info.value.reason == "deleted"
    assert not target.exists()


def test_new_file_never_overwrites_silently(tmp_path):
    target = tmp_path / "job.toml"
    storage.save_text(target, OLD)
    with pytest.raises(storage.NameTaken) as info:
        storage.save_text(target, "other\n")
    # the diff says what overwriting would change: the file there now against the new text
    assert info.value.reason == "exists" and '-title = "old text"' in info.value.diff
    assert "+other" in info.value.diff
    with pytest.raises(storage.NameTaken) as same:
        storage.save_text(target, OLD)
    assert same.value.diff == ""  # the same text: nothing would change
    assert target.read_text(encoding="utf-8") == OLD
    storage.save_text(target, "other\n", overwrite=True)
    assert target.read_text(encoding="utf-8") == "other\n"


def test_lock_held_elsewhere_gives_clear_message(tmp_path, monkeypatch):
    target = tmp_path / "job.toml"
    monkeypatch.setattr(storage, "LOCK_TIMEOUT", 0.2)
    holder = _child("""
        import sys, time
        from shopbeam.jobs import storage
        with storage.locked(sys.argv[1]):
            print("READY", flush=True)
            time.sleep(30)
    """, str(target))
    try:
        _wait_ready(holder)
        with pytest.raises(InputError, match="someone else is saving"):
            storage.save_text(target, OLD)
    finally:
        holder.kill()
        holder.wait()
        holder.stdout.close()
        holder.stderr.close()
    assert not target.exists()
    storage.save_text(target, OLD)  # free again
    assert target.read_text(encoding="utf-8") == OLD


def test_open_text_errors_are_input_errors(tmp_path):
    with pytest.raises(InputError, match="no such file"):
        storage.open_text(tmp_path / "missing.toml")
    with pytest.raises(InputError, match="folder"):
        storage.open_text(tmp_path)
    bad = tmp_path / "latin1.toml"
    bad.write_bytes(b'title = "caf\xe9"\n')
    with pytest.raises(InputError, match="UTF-8"):
        storage.open_text(bad)


# ------------------------------------------------------------------ names

@pytest.mark.parametrize("name, words", [
    ("../x", "'..'"),
    ("../../etc/passwd", "'..'"),
    ("/etc/x", "absolute path"),
    ("C:\\jobs\\x", "absolute path"),
    ("sub/x", "separator"),
    ("sub\\x", "separator"),
    ("..", "'..'"),
    (".hidden", "must start with a letter or digit"),
    ("bay 3 arm", "not allowed (' ')"),
    ("arm;rm -rf", "not allowed"),
    ("arm$HOME", "not allowed ('$')"),
    ("arm\x00", "not allowed"),
    ("b\u00e4y", "not allowed"),
    ("", "required"),
    ("a" * 65, "at most 64"),
    ("con", "reserved device name"),
    ("NUL.toml", "reserved device name"),
])
def test_unsafe_names_are_refused_with_a_clear_message(name, words, tmp_path):
    with pytest.raises(InputError) as info:
        storage.path_in(tmp_path, name)
    msg = str(info.value)
    assert words in msg
    assert "use letters, digits" in msg and "for example '" in msg
    suggestion = msg.split("for example '")[1].split("'")[0]
    assert storage.safe_name(suggestion) == suggestion  # the suggestion itself is safe


@pytest.mark.parametrize("name, stem", [
    ("rack-arm", "rack-arm"), ("Bay_3.arm", "Bay_3.arm"), ("w8x18-loft.toml", "w8x18-loft"),
    ("  padded  ", "padded"), ("a" * 64, "a" * 64),
])
def test_safe_names_are_accepted(name, stem, tmp_path):
    assert storage.safe_name(name) == stem
    p = storage.path_in(tmp_path, name)
    assert p == (tmp_path / (stem + ".toml")).resolve()


def test_symlink_out_of_the_folder_is_refused(tmp_path):
    lib, outside = tmp_path / "lib", tmp_path / "outside"
    lib.mkdir()
    outside.mkdir()
    (lib / "sneaky.toml").symlink_to(outside / "target.toml")
    with pytest.raises(InputError, match="outside the library folder"):
        storage.path_in(lib, "sneaky")


# ------------------------------------------------------------------ two writers at once

COUNTER = """
    import sys
    from shopbeam.jobs import storage
    path, n = sys.argv[1], int(sys.argv[2])
    def bump(text):
        return f"count = {int(text.split('=')[1]) + 1}\\n"
    print("READY", flush=True)
    for _ in range(n):
        storage.update_text(path, bump, create="count = 0\\n")
"""


def test_two_processes_updating_the_shop_library_lose_nothing(tmp_path):
    target = tmp_path / "index.toml"
    n = 40
    procs = [_child(COUNTER, str(target), str(n)) for _ in range(2)]
    try:
        for p in procs:
            _wait_ready(p)
        for p in procs:
            assert p.wait(timeout=60) == 0, p.stderr.read()
    finally:
        for p in procs:
            if p.poll() is None:
                p.kill()
            p.stdout.close()
            p.stderr.close()
    assert target.read_text(encoding="utf-8") == f"count = {2 * n}\n"  # no lost update


WRITER = """
    import sys
    from shopbeam.jobs import storage
    path, mark, n = sys.argv[1], sys.argv[2], int(sys.argv[3])
    body = (mark * 99 + "\\n") * 20000          # about 2 MB, so a write takes a while
    print("READY", flush=True)
    for i in range(n):
        storage.save_text(path, f"# {mark} {i}\\n" + body, None, overwrite=True)
"""


def test_two_processes_saving_at_once_never_leave_a_torn_file(tmp_path):
    target = tmp_path / "shared.toml"
    procs = [_child(WRITER, str(target), mark, "6") for mark in ("a", "b")]
    seen = set()
    try:
        for p in procs:
            _wait_ready(p)
        while any(p.poll() is None for p in procs):
            if target.exists():
                text = target.read_text(encoding="utf-8")
                head, _, body = text.partition("\n")
                assert head.startswith(("# a ", "# b ")), "torn file: " + head[:20]
                mark = head.split()[1]
                assert body == (mark * 99 + "\n") * 20000, "torn file"
                seen.add(mark)
        for p in procs:
            assert p.returncode == 0, p.stderr.read()
    finally:
        for p in procs:
            if p.poll() is None:
                p.kill()
            p.stdout.close()
            p.stderr.close()
    final = target.read_text(encoding="utf-8")
    assert final.splitlines()[0] in ("# a 5", "# b 5")
    assert not list(tmp_path.glob("*.saving"))


RACER = """
    import sys
    from shopbeam.jobs import storage
    path, text = sys.argv[1], sys.argv[2]
    base = storage.open_text(path)
    print("READY", flush=True)
    input()
    try:
        storage.save_text(path, text + "\\n", base)
        print("SAVED", flush=True)
    except storage.SaveConflict:
        print("CONFLICT", flush=True)
"""


def test_two_people_saving_the_same_opened_file_one_wins_one_is_told(tmp_path):
    target = tmp_path / "arm.toml"
    target.write_text(OLD, encoding="utf-8")
    procs = [subprocess.Popen([sys.executable, "-c", textwrap.dedent(RACER), str(target), who],
                              stdin=subprocess.PIPE, stdout=subprocess.PIPE,
                              stderr=subprocess.PIPE, text=True)
             for who in ("alice", "bob")]
    try:
        for p in procs:
            _wait_ready(p)
        for p in procs:  # both open the same version, then both save
            p.stdin.write("go\n")
            p.stdin.flush()
        outs = [p.communicate(timeout=30)[0].strip() for p in procs]
    finally:
        for p in procs:
            if p.poll() is None:
                p.kill()
    assert sorted(outs) == ["CONFLICT", "SAVED"], outs
    winner = ("alice", "bob")[outs.index("SAVED")]
    assert target.read_text(encoding="utf-8") == winner + "\n"


def test_a_saves_temp_file_is_born_with_the_saved_files_mode(tmp_path):
    # born 0600 (mkstemp), a temp killed before its mode was set could not be opened, and so
    # not tidied, by the folder's other members for an hour; it now starts with the mode the
    # saved file gets (less the umask)
    fd, tmp = storage._new_temp(tmp_path, "arm.toml", 0o664)
    os.close(fd)
    umask = os.umask(0)
    os.umask(umask)
    assert os.stat(tmp).st_mode & 0o777 == 0o664 & ~umask
    assert os.path.basename(tmp).startswith(".arm.toml.") and tmp.endswith(".saving")
