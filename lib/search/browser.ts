// Types and limits that the browser may import (no index data).
export { MAX_QUERY_LENGTH, MAX_RESULTS, type SearchHit, type Segment } from "./index";
