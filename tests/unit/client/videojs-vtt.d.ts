// Types for the parts of videojs-vtt.js (the WebVTT parser video.js uses in the browser) that the
// watch-page tests read the metadata track with.
declare module 'videojs-vtt.js' {
  interface ParsedCue {
    id: string;
    startTime: number;
    endTime: number;
    text: string;
  }
  interface Parser {
    oncue: (cue: ParsedCue) => void;
    parse(text: string): Parser;
    flush(): Parser;
  }
  const vttjs: {
    WebVTT: {
      Parser: new (window: unknown, vttjs: unknown, decoder: unknown) => Parser;
      StringDecoder(): unknown;
    };
    VTTCue: unknown;
  };
  export default vttjs;
}
