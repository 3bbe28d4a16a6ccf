// The JSON body of every failed API response, read by the client's error interceptor.
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    fields?: { field: string; message: string }[];
  };
}
