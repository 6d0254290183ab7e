@echo off
rem countercheck, as installed from the release archive: its own Java runtime and jar.
rem COUNTERCHECK_JAVA_OPTS adds or overrides JVM options. The heap is capped at 2 GB (20 000 elements fit).
rem As run.sh does: once, it reviews the starter example twice (the second time over the reports of the
rem first) while listing the classes a review loads and stores them in a class-data-sharing archive
rem beside the jar (when that folder is writable); every run then maps the archive in and starts faster.
rem The Java runtime ignores an archive that no longer matches the jar (delete countercheck.jsa after
rem replacing the jar by hand to have it made again).
setlocal
set "HERE=%~dp0"
set "JAVA=%HERE%..\runtime\bin\java.exe"
if not exist "%JAVA%" set "JAVA=java"
set "JAR=%HERE%..\lib\countercheck.jar"
set "JSA=%HERE%..\lib\countercheck.jsa"
set OPTS=-XX:TieredStopAtLevel=1 -XX:+UseSerialGC -Xmx2g -Xshare:auto -Xlog:cds=off
if not exist "%JSA%" call :archive
if exist "%JSA%" set OPTS=%OPTS% "-XX:SharedArchiveFile=%JSA%"
"%JAVA%" %OPTS% %COUNTERCHECK_JAVA_OPTS% -jar "%JAR%" %*
exit /b %ERRORLEVEL%

:archive
rem Made in a temporary folder and moved into place, so that a concurrent run never maps half an archive.
set "WORK=%TEMP%\countercheck-cds-%RANDOM%%RANDOM%"
mkdir "%WORK%" >nul 2>&1 || exit /b 0
"%JAVA%" %OPTS% -jar "%JAR%" example >"%WORK%\example.yaml" 2>nul || goto :archived
rem Reviewed twice, the classes listed in the second run: a review usually replaces the reports of the one
rem before, which it first reads to recognise them as its own. Its exit status does not matter here.
"%JAVA%" %OPTS% -jar "%JAR%" review "%WORK%\example.yaml" --out "%WORK%" --date 2026-01-01 >nul 2>&1
"%JAVA%" %OPTS% "-XX:DumpLoadedClassList=%WORK%\classes.lst" -jar "%JAR%" review "%WORK%\example.yaml" --out "%WORK%" --date 2026-01-01 --pdf >nul 2>&1
if exist "%WORK%\classes.lst" "%JAVA%" %OPTS% -Xshare:dump "-XX:SharedClassListFile=%WORK%\classes.lst" "-XX:SharedArchiveFile=%WORK%\countercheck.jsa" -cp "%JAR%" >nul 2>&1
if exist "%WORK%\countercheck.jsa" move /y "%WORK%\countercheck.jsa" "%JSA%" >nul 2>&1
:archived
rmdir /s /q "%WORK%" >nul 2>&1
exit /b 0
