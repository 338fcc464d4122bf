// A stand-in for lib/store/device: the real LocalStore on memory tables, the real autosync,
// and an engine double whose calls the tests read. Use inside jest.mock's factory.
export function deviceMock() {
  const { LocalStore } = jest.requireActual('@/lib/store/local-store');
  const { memoryTables } = jest.requireActual('@/lib/store/memory');
  const { createSyncStatusStore } = jest.requireActual('@/lib/sync/status-store');
  const { autoSync } = jest.requireActual('@/lib/sync/autosync');
  let n = 0;
  const store = new LocalStore(memoryTables(), {
    ...jest.requireActual('../sync/node-crypto').nodeCrypto,
    newId: () => `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`,
  });
  const engine = { start: jest.fn(), stop: jest.fn(), setOnline: jest.fn(), syncNow: jest.fn(async () => undefined) };
  const syncStatus = createSyncStatusStore();
  const opened = Promise.resolve({ userId: 'u1', store, engine });
  let started = false;
  const openDevice = () => {
    if (!started) autoSync(store, engine, syncStatus); // as the real openDevice does
    started = true;
    return opened;
  };
  return { __esModule: true, syncStatus, openDevice, stopDevices: () => undefined };
}
