export * from './workingWindows';
