// Browser tests drive a real Chromium on a busy 2-core machine; a test that
// fails is run once more (and its first failure is still printed). A real
// fault fails both times.
jest.retryTimes(1, { logErrorsBeforeRetry: true });
